/**
 * `npm run bench:load [-- --seconds 30 --connections 50 --readers 1000 --soak 300 --pgbouncer]`
 * (`--quick`: 10 s, 200 readers, 20 s soak; `--profile`: one instance only, with a V8 CPU profile
 * in .data/profiles; `--port-base N`: nginx on N, the instances on N+1…, a single one on N+9, else free ports;
 * `--instances N`: N instances behind nginx, 3 by default, at most 8; `--only empty|push|big`: one kind only):
 * the load budget. A bounded Node client (keep-alive, a fixed number of connections, each
 * sending one request after another) drives a realistic mix for `--seconds`:
 *   80 % pulls with nothing new (readers at the end of their data),
 *   15 % small pushes of 1–20 changes (new books),
 *    5 % big pulls (a first page of 1,000 changes from a reader with 2,500),
 * spread over `--readers` throwaway readers, first through nginx in front of three instances,
 * then against one instance without the proxy (the baseline, same run, same database).
 * Then the cluster runs the same mix for `--soak` seconds while each instance's RSS is sampled.
 * Instances log at warn so the bench measures serving, not this machine's log pipe. Besides
 * latencies it prints the servers' CPU time per request, which other work on a shared machine
 * moves far less than latency.
 * Goals (issue 23): p99 < 100 ms for empty pulls and small pushes, no errors, flat memory.
 */
import { randomUUID } from 'node:crypto';
import http from 'node:http';
import path from 'node:path';

import { HlcClock } from '../shared/sync/hlc';
import type { FieldChange } from '../shared/api/sync';
import { loadConfig } from '../sync-server/src/config';
import { createDataSource } from '../sync-server/src/data-access/data-source';
import { migrate } from '../sync-server/src/data-access/migrate';
import { SyncStore } from '../sync-server/src/data-access/sync-store';
import { signAccessToken } from '../sync-server/src/domain/access-tokens';
import { startCluster, startInstance } from './ops/cluster';
import { stopChild } from './ops/processes';
import {
  cpuSeconds,
  newTally,
  parentPid,
  printClosing,
  printSummary,
  rssMb,
  summarise,
  treeCpuSeconds,
  type Kind,
  type Summary,
  type Tally,
} from './bench-support/load-report';

/** `--name=value` or `--name value`. */
function flag(name: string, fallback: number): number {
  const args = process.argv;
  const joined = args.find((arg) => arg.startsWith(`--${name}=`));
  if (joined) return Number(joined.slice(name.length + 3));
  const at = args.indexOf(`--${name}`);
  return at >= 0 && args[at + 1] !== undefined ? Number(args[at + 1]) : fallback;
}
const PROFILE = process.argv.includes('--profile');
const QUICK = process.argv.includes('--quick');
const SECONDS = flag('seconds', QUICK ? 10 : 30);
const CONNECTIONS = flag('connections', 50);
const READERS = flag('readers', QUICK ? 200 : 1000);
const SOAK_SECONDS = flag('soak', QUICK ? 20 : 300);
const PORT_BASE = flag('port-base', 0);
/** Instances behind nginx (3 by default, as issue 23 asks; `--instances 1` or 2 shows what fits a small machine). */
const INSTANCES = flag('instances', 3);
/** `--compare PATH`: another build's sync-server/src/main.js, run against this one on a single instance in alternating rounds. */
const COMPARE = (() => {
  const at = process.argv.findIndex((arg) => arg === '--compare' || arg.startsWith('--compare='));
  if (at < 0) return null;
  return process.argv[at]!.includes('=') ? process.argv[at]!.split('=')[1]! : process.argv[at + 1]!;
})();
/** `--only empty|push|big`: one kind of request only (profiling what one kind costs). */
const ONLY = (() => {
  const at = process.argv.findIndex((arg) => arg === '--only' || arg.startsWith('--only='));
  if (at < 0) return null;
  const value = process.argv[at]!.includes('=') ? process.argv[at]!.split('=')[1]! : process.argv[at + 1]!;
  const kinds: Record<string, Kind> = { empty: 'empty pull', push: 'small push', big: 'big pull' };
  if (!kinds[value]) throw new Error(`--only takes empty, push or big, not ${value}`);
  return kinds[value];
})();
const COMPARE_ROUNDS = 4;
const WARM_UP_SECONDS = QUICK ? 3 : 5;
const HEAVY = Math.max(1, Math.round(READERS * 0.05));
const WRITERS = Math.max(1, Math.round(READERS * 0.15));
const HEAVY_BOOKS = 500; // × 5 fields = 2,500 changes each
const SECRET = 'bench-load-secret-bench-load-secret-0123';

interface Reader {
  token: string;
  cursor?: string;
  clock: HlcClock;
}

const agent = new http.Agent({ keepAlive: true, maxSockets: CONNECTIONS });

function send(base: URL, method: string, path: string, token: string, body?: string): Promise<{ status: number; text: string }> {
  return new Promise((resolve, reject) => {
    const req = http.request(
      {
        agent,
        host: base.hostname,
        port: base.port,
        method,
        path,
        headers: { authorization: `Bearer ${token}`, ...(body ? { 'content-type': 'application/json', 'content-length': Buffer.byteLength(body) } : {}) },
      },
      (res) => {
        const chunks: Buffer[] = [];
        res.on('data', (chunk: Buffer) => chunks.push(chunk));
        res.on('end', () => resolve({ status: res.statusCode ?? 0, text: Buffer.concat(chunks).toString() }));
        res.on('error', reject);
      },
    );
    req.on('error', reject);
    req.end(body);
  });
}

/** New books, 1–20 field changes in all, stamped by the writer's own clock. */
function smallPush(writer: Reader): string {
  const count = 1 + Math.floor(Math.random() * 20);
  const changes: FieldChange[] = [];
  let rowId = randomUUID();
  for (let n = 0; n < count; n++) {
    if (n % 4 === 0) rowId = randomUUID();
    const field = ['title', 'format', 'status', 'rating'][n % 4]!;
    const value = { title: `Load test volume ${n}`, format: 'print', status: 'tbr', rating: 3.5 }[field];
    changes.push({ id: randomUUID(), collection: 'books', rowId, field, value, hlc: writer.clock.tick() });
  }
  return JSON.stringify({ deviceId: 'bench-device', changes });
}

type Readers = { quiet: Reader[]; writers: Reader[]; heavy: Reader[] };

/** PostgreSQL's postmaster (its backends are its children), when it runs on this machine; found at start. */
let postmasterPid: number | undefined;
/** nginx's master process (and PgBouncer, when asked for) while the cluster runs. */
let nginxPid: number | undefined;
let pgBouncerPid: number | undefined;

/** CPU seconds so far of each part of the set-up besides the servers. */
function otherParts(): Record<string, number> {
  const own = process.cpuUsage();
  return {
    PostgreSQL: treeCpuSeconds(postmasterPid),
    ...(nginxPid ? { nginx: treeCpuSeconds(nginxPid) } : {}),
    ...(pgBouncerPid ? { PgBouncer: treeCpuSeconds(pgBouncerPid) } : {}),
    'this client': (own.user + own.system) / 1e6,
  };
}

/** Runs the mix for `seconds`; `servers` are the pids whose CPU time is counted. */
async function drive(base: URL, readers: Readers, seconds: number, servers: (number | undefined)[], onTick?: () => void): Promise<Tally> {
  const tally = newTally(seconds);
  const cpuBefore = servers.map(cpuSeconds);
  const othersBefore = otherParts();
  // A device syncs one request at a time: a reader already in flight is not picked again (the server
  // allows two pulls at once per reader and answers a third with 429, which no real client sends).
  const busy = new Set<Reader>();
  // A few random tries find a free reader at once; when every reader of a kind is in flight
  // (few heavy readers, many connections), the connection waits a moment.
  const pick = async (list: Reader[]) => {
    for (;;) {
      for (let attempt = 0; attempt < 8; attempt++) {
        const reader = list[Math.floor(Math.random() * list.length)]!;
        if (!busy.has(reader)) return busy.add(reader) && reader;
      }
      const free = list.filter((reader) => !busy.has(reader));
      if (free.length > 0) return busy.add(free[0]!) && free[0]!;
      await new Promise((resolve) => setTimeout(resolve, 1));
    }
  };
  const until = Date.now() + seconds * 1000;
  const timer = onTick ? setInterval(onTick, 10_000) : undefined;
  await Promise.all(
    Array.from({ length: CONNECTIONS }, async () => {
      while (Date.now() < until) {
        const roll = Math.random();
        const kind: Kind = ONLY ?? (roll < 0.8 ? 'empty pull' : roll < 0.95 ? 'small push' : 'big pull');
        let status: number | string;
        let reader: Reader | undefined;
        // Timed from the request, not from waiting for a free reader of its kind.
        let started = process.hrtime.bigint();
        try {
          reader = await pick(kind === 'empty pull' ? readers.quiet : kind === 'small push' ? readers.writers : readers.heavy);
          started = process.hrtime.bigint();
          if (kind === 'empty pull') {
            status = (await send(base, 'GET', `/api/sync/pull?since=${reader.cursor}`, reader.token)).status;
          } else if (kind === 'small push') {
            status = (await send(base, 'POST', '/api/sync/push', reader.token, smallPush(reader))).status;
          } else {
            status = (await send(base, 'GET', '/api/sync/pull?limit=1000', reader.token)).status;
          }
        } catch (error) {
          status = (error as { code?: string }).code ?? 'error';
        } finally {
          if (reader) busy.delete(reader);
        }
        tally.latencies[kind].push(Number(process.hrtime.bigint() - started) / 1e6);
        if (status !== 200) tally.errors[kind]++;
        tally.statuses.set(status, (tally.statuses.get(status) ?? 0) + 1);
      }
    }),
  );
  clearInterval(timer);
  tally.serverCpuSeconds = servers.reduce<number>((sum, pid, i) => sum + cpuSeconds(pid) - cpuBefore[i]!, 0);
  tally.cpuByPart = { servers: tally.serverCpuSeconds };
  for (const [part, seconds] of Object.entries(otherParts())) tally.cpuByPart[part] = seconds - (othersBefore[part] ?? seconds);
  return tally;
}

function report(label: string, tally: Tally): Summary {
  const summary = summarise(label, tally);
  printSummary(summary, tally, CONNECTIONS);
  return summary;
}

/** Each quiet reader's cursor at the end of their data: their pulls find nothing new. */
async function settleCursors(base: URL, readers: Readers): Promise<void> {
  await Promise.all(
    readers.quiet.map(async (reader) => {
      reader.cursor = (JSON.parse((await send(base, 'GET', '/api/sync/pull', reader.token)).text) as { cursor: string }).cursor;
    }),
  );
}

async function main(): Promise<void> {
  const began = Date.now();
  console.log(
    `bench:load ${process.argv.slice(2).join(' ') || '(defaults)'}: ${SECONDS} s per run, ${CONNECTIONS} connections, ${READERS} readers, soak ${SOAK_SECONDS} s`,
  );
  const env = {
    ...process.env,
    LAMPLIGHT_JWT_SECRET: SECRET,
    NODE_ENV: 'production',
    SMTP_URL: 'smtp://127.0.0.1:2525',
    LAMPLIGHT_LOG_LEVEL: 'warn',
  };
  const config = loadConfig(env);
  const dataSource = createDataSource(config.databaseUrl);
  await dataSource.initialize();
  await migrate(dataSource);
  const [{ pid: backendPid }] = (await dataSource.query('SELECT pg_backend_pid() AS pid')) as [{ pid: number }];
  try {
    postmasterPid = parentPid(backendPid);
  } catch {
    // PostgreSQL runs elsewhere: its CPU is not counted.
  }

  console.log(`Making ${READERS} readers (${HEAVY} with ${HEAVY_BOOKS * 5} changes each, ${WRITERS} writers, the rest with a few books)…`);
  const store = new SyncStore(dataSource);
  const all: Reader[] = [];
  for (let n = 0; n < READERS; n++) {
    const [{ id: userId }] = await dataSource.query(`INSERT INTO users (email, display_name, password_hash) VALUES ($1, 'Load Reader', 'x') RETURNING id`, [
      `load-${randomUUID()}@example.com`,
    ]);
    const [{ id: sessionId }] = await dataSource.query(`INSERT INTO device_sessions (user_id, name) VALUES ($1, 'bench') RETURNING id`, [userId]);
    const clock = new HlcClock(`seed${n}`);
    const books = n < HEAVY ? HEAVY_BOOKS : 3;
    for (let start = 0; start < books; start += 100) {
      const changes: FieldChange[] = [];
      for (let b = start; b < Math.min(books, start + 100); b++) {
        const rowId = randomUUID();
        const values = { title: `Seed volume ${b}`, authors: [`Writer ${b % 31}`], format: 'ebook', status: 'finished', rating: 4 };
        for (const [field, value] of Object.entries(values)) changes.push({ id: randomUUID(), collection: 'books', rowId, field, value, hlc: clock.tick() });
      }
      await store.push(userId, changes);
    }
    all.push({ token: await signAccessToken({ userId, sessionId, role: 'reader' }, config.jwtSecret), clock: new HlcClock(`dev${n}`) });
  }
  const readers = { heavy: all.slice(0, HEAVY), writers: all.slice(HEAVY, HEAVY + WRITERS), quiet: all.slice(HEAVY + WRITERS) };
  await dataSource.destroy();

  if (COMPARE) {
    await compareBuilds(env, readers);
    return;
  }
  if (PROFILE) {
    // Profiling looks at one instance only.
    await profileBaseline(env, readers);
    return;
  }
  const ports = PORT_BASE ? { listen: `127.0.0.1:${PORT_BASE}`, instancePorts: Array.from({ length: INSTANCES }, (_, n) => PORT_BASE + 1 + n) } : {};
  const cluster = await startCluster({ env, instances: INSTANCES, ...ports, ...(process.argv.includes('--pgbouncer') ? { pgBouncerPort: 0 } : {}) });
  let clusterSummary: Summary;
  const soak: string[] = [];
  try {
    const proxied = new URL(cluster.baseUrl);
    const pids = cluster.instances.map((instance) => instance.child.pid);
    nginxPid = cluster.nginx.child.pid;
    pgBouncerPid = cluster.pgBouncer?.child.pid;
    await settleCursors(proxied, readers);
    // Each instance compiles its hot paths on its own share of the requests: warm-up per instance.
    const warmUp = WARM_UP_SECONDS * INSTANCES;
    console.log(
      `\nThrough nginx → ${INSTANCES} instance(s)${cluster.pgBouncer ? ' → PgBouncer' : ''}: ${CONNECTIONS} connections, ${SECONDS} s (after ${warmUp} s of warm-up)`,
    );
    await drive(proxied, readers, warmUp, pids);
    clusterSummary = report('cluster', await drive(proxied, readers, SECONDS, pids));

    if (SOAK_SECONDS > 0) {
      const start = pids.map(rssMb);
      const samples: number[][] = [start];
      console.log(`\nSoak: the same mix through the cluster for ${SOAK_SECONDS} s; RSS sampled every 10 s`);
      const soakTally = await drive(proxied, readers, SOAK_SECONDS, pids, () => samples.push(pids.map(rssMb)));
      const end = pids.map(rssMb);
      soak.push(
        ...cluster.instances.map(
          (instance, i) => `${instance.name}: RSS ${start[i]} MB → ${end[i]} MB (max ${Math.max(...samples.map((sample) => sample[i]!), end[i]!)} MB)`,
        ),
      );
      report('soak', soakTally);
      for (const line of soak) console.log(`  ${line}`);
    }
  } finally {
    await cluster.stop();
    nginxPid = pgBouncerPid = undefined;
  }

  const single = await startInstance('single', PORT_BASE ? PORT_BASE + 9 : 0, { ...env, LAMPLIGHT_TRUST_PROXY: '' }, false);
  const direct = new URL(`http://127.0.0.1:${single.port}`);
  console.log(`\nBaseline: one instance, no proxy, same mix`);
  let singleSummary: Summary;
  try {
    await drive(direct, readers, WARM_UP_SECONDS, [single.child.pid]);
    singleSummary = report('single instance', await drive(direct, readers, SECONDS, [single.child.pid]));
  } finally {
    await stopChild(single.child);
  }
  printClosing(clusterSummary, singleSummary, soak, CONNECTIONS);
  console.log(`Took ${((Date.now() - began) / 60_000).toFixed(1)} min.`);
  agent.destroy();
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});

async function profileBaseline(env: Record<string, string | undefined>, readers: Readers): Promise<void> {
  const single = await startInstance('single', PORT_BASE ? PORT_BASE + 9 : 0, { ...env, LAMPLIGHT_TRUST_PROXY: '' }, false, [
    '--cpu-prof',
    `--cpu-prof-dir=${path.resolve('.data/profiles')}`,
  ]);
  const direct = new URL(`http://127.0.0.1:${single.port}`);
  try {
    await settleCursors(direct, readers);
    await drive(direct, readers, WARM_UP_SECONDS, [single.child.pid]);
    report('single instance (profiled)', await drive(direct, readers, SECONDS, [single.child.pid]));
  } finally {
    await stopChild(single.child, 30_000);
  }
  agent.destroy();
}

/**
 * Before/after on a busy machine: one instance of each build in turn, `COMPARE_ROUNDS` rounds of
 * `--seconds` each, the order alternating, so both meet the same background load; medians.
 */
async function compareBuilds(env: Record<string, string | undefined>, readers: Readers): Promise<void> {
  const builds = [
    { label: `other build (${COMPARE})`, main: COMPARE!, runs: [] as Summary[] },
    { label: 'this build', main: undefined, runs: [] as Summary[] },
  ];
  for (let round = 0; round < COMPARE_ROUNDS; round++) {
    for (const build of round % 2 === 0 ? builds : [...builds].reverse()) {
      const single = await startInstance(
        'single',
        PORT_BASE ? PORT_BASE + 9 : 0,
        { ...env, LAMPLIGHT_TRUST_PROXY: '', LAMPLIGHT_BENCH_SERVER_MAIN: build.main },
        false,
      );
      const direct = new URL(`http://127.0.0.1:${single.port}`);
      try {
        await settleCursors(direct, readers);
        await drive(direct, readers, WARM_UP_SECONDS, [single.child.pid]);
        build.runs.push(report(`round ${round + 1}, ${build.label}`, await drive(direct, readers, SECONDS, [single.child.pid])));
      } finally {
        await stopChild(single.child);
      }
    }
  }
  const median = (values: number[]) => [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)]!;
  console.log(`\n== Medians of ${COMPARE_ROUNDS} alternating rounds, one instance each ==`);
  for (const build of builds) {
    const kinds = (['empty pull', 'small push', 'big pull'] as Kind[]).map(
      (kind) =>
        `${kind} p50/p99 ${median(build.runs.map((run) => run.rows[kind].p50)).toFixed(1)}/${median(build.runs.map((run) => run.rows[kind].p99)).toFixed(1)} ms`,
    );
    console.log(
      `${build.label}: ${median(build.runs.map((run) => run.rps)).toFixed(0)} requests/s, server CPU ${median(build.runs.map((run) => run.cpuMsPerRequest)).toFixed(2)} ms/request, errors ${build.runs.reduce((sum, run) => sum + run.errors, 0)}; ${kinds.join('; ')}`,
    );
  }
  agent.destroy();
}
