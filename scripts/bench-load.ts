/**
 * `npm run bench:load [-- --seconds=30 --connections=50 --readers=1000 --soak=60 --pgbouncer]`:
 * the load budget. A bounded Node client (keep-alive, a fixed number of connections, each
 * sending one request after another) drives a realistic mix for `--seconds`:
 *   80 % pulls with nothing new (readers at the end of their data),
 *   15 % small pushes of 1–20 changes (new books),
 *    5 % big pulls (a first page of 1,000 changes from a reader with 2,500),
 * spread over `--readers` throwaway readers, first through nginx in front of three instances,
 * then against one instance without the proxy (the baseline, same run, same database).
 * Then the cluster runs the same mix for `--soak` seconds while each instance's RSS is sampled.
 * Instances log at warn so the bench measures serving, not this machine's log pipe.
 * Goals (issue 23): p99 < 100 ms for empty pulls and small pushes, no errors, flat memory.
 */
import { randomUUID } from 'node:crypto';
import { readFileSync } from 'node:fs';
import http from 'node:http';
import path from 'node:path';

import { quantile } from 'simple-statistics';

import { HlcClock } from '../shared/sync/hlc';
import type { FieldChange } from '../shared/api/sync';
import { loadConfig } from '../sync-server/src/config';
import { createDataSource } from '../sync-server/src/data-access/data-source';
import { migrate } from '../sync-server/src/data-access/migrate';
import { SyncStore } from '../sync-server/src/data-access/sync-store';
import { signAccessToken } from '../sync-server/src/domain/access-tokens';
import { startCluster, startInstance } from './ops/cluster';
import { stopChild } from './ops/processes';

/** `--name=value` or `--name value`. */
function flag(name: string, fallback: number): number {
  const args = process.argv;
  const joined = args.find((arg) => arg.startsWith(`--${name}=`));
  if (joined) return Number(joined.slice(name.length + 3));
  const at = args.indexOf(`--${name}`);
  return at >= 0 && args[at + 1] !== undefined ? Number(args[at + 1]) : fallback;
}
const PROFILE = process.argv.includes('--profile');
const SECONDS = flag('seconds', 30);
const CONNECTIONS = flag('connections', 50);
const READERS = flag('readers', 1000);
const SOAK_SECONDS = flag('soak', 60);
const WARM_UP_SECONDS = 5;
const HEAVY = Math.max(1, Math.round(READERS * 0.05));
const WRITERS = Math.max(1, Math.round(READERS * 0.15));
const HEAVY_BOOKS = 500; // × 5 fields = 2,500 changes each
const SECRET = 'bench-load-secret-bench-load-secret-0123';

type Kind = 'empty pull' | 'small push' | 'big pull';
interface Reader {
  token: string;
  cursor?: string;
  clock: HlcClock;
}
interface Tally {
  latencies: Record<Kind, number[]>;
  errors: Record<Kind, number>;
  statuses: Map<number | string, number>;
  seconds: number;
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

async function drive(base: URL, readers: { quiet: Reader[]; writers: Reader[]; heavy: Reader[] }, seconds: number, onTick?: () => void): Promise<Tally> {
  const tally: Tally = {
    latencies: { 'empty pull': [], 'small push': [], 'big pull': [] },
    errors: { 'empty pull': 0, 'small push': 0, 'big pull': 0 },
    statuses: new Map(),
    seconds,
  };
  // A device syncs one request at a time: a reader already in flight is not picked again (the server
  // allows two pulls at once per reader and answers a third with 429, which no real client sends).
  const busy = new Set<Reader>();
  const pick = (list: Reader[]) => {
    let reader = list[Math.floor(Math.random() * list.length)]!;
    while (busy.has(reader)) reader = list[Math.floor(Math.random() * list.length)]!;
    busy.add(reader);
    return reader;
  };
  const until = Date.now() + seconds * 1000;
  const timer = onTick ? setInterval(onTick, 10_000) : undefined;
  await Promise.all(
    Array.from({ length: CONNECTIONS }, async () => {
      while (Date.now() < until) {
        const roll = Math.random();
        const kind: Kind = roll < 0.8 ? 'empty pull' : roll < 0.95 ? 'small push' : 'big pull';
        const started = process.hrtime.bigint();
        let status: number | string;
        let reader: Reader | undefined;
        try {
          if (kind === 'empty pull') {
            reader = pick(readers.quiet);
            status = (await send(base, 'GET', `/api/sync/pull?since=${reader.cursor}`, reader.token)).status;
          } else if (kind === 'small push') {
            reader = pick(readers.writers);
            status = (await send(base, 'POST', '/api/sync/push', reader.token, smallPush(reader))).status;
          } else {
            reader = pick(readers.heavy);
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
  return tally;
}

const rssMb = (pid: number | undefined) => {
  const match = /VmRSS:\s+(\d+) kB/.exec(readFileSync(`/proc/${pid}/status`, 'utf8'));
  return Math.round(Number(match?.[1]) / 1024);
};

function report(label: string, tally: Tally): Record<Kind, { rps: number; p50: number; p99: number }> {
  const total = Object.values(tally.latencies).reduce((sum, list) => sum + list.length, 0);
  const errors = Object.values(tally.errors).reduce((sum, n) => sum + n, 0);
  console.log(
    `\n${label}: ${(total / tally.seconds).toFixed(0)} requests/s, ${errors} errors (statuses: ${[...tally.statuses].map(([s, n]) => `${s}×${n}`).join(', ')})`,
  );
  const rows = {} as Record<Kind, { rps: number; p50: number; p99: number }>;
  for (const kind of Object.keys(tally.latencies) as Kind[]) {
    const list = tally.latencies[kind];
    const row = { rps: list.length / tally.seconds, p50: list.length ? quantile(list, 0.5) : NaN, p99: list.length ? quantile(list, 0.99) : NaN };
    rows[kind] = row;
    console.log(
      `  ${kind.padEnd(11)} ${row.rps.toFixed(0).padStart(6)}/s  p50 ${row.p50.toFixed(1).padStart(6)} ms  p99 ${row.p99.toFixed(1).padStart(7)} ms  errors ${tally.errors[kind]}`,
    );
  }
  return rows;
}

async function main(): Promise<void> {
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

  if (PROFILE) {
    // Profiling looks at one instance only.
    await profileBaseline(env, readers);
    return;
  }
  const cluster = await startCluster({ env, ...(process.argv.includes('--pgbouncer') ? { pgBouncerPort: 0 } : {}) });
  let clusterRows: ReturnType<typeof report>;
  try {
    const proxied = new URL(cluster.baseUrl);
    // Each quiet reader's cursor at the end of their data: their pulls find nothing new.
    await Promise.all(
      readers.quiet.map(async (reader) => {
        reader.cursor = (JSON.parse((await send(proxied, 'GET', '/api/sync/pull', reader.token)).text) as { cursor: string }).cursor;
      }),
    );
    console.log(
      `\nThrough nginx → 3 instances${cluster.pgBouncer ? ' → PgBouncer' : ''}: ${CONNECTIONS} connections, ${SECONDS} s (after ${WARM_UP_SECONDS} s of warm-up)`,
    );
    await drive(proxied, readers, WARM_UP_SECONDS);
    clusterRows = report('cluster', await drive(proxied, readers, SECONDS));

    let soak: string[] = [];
    if (SOAK_SECONDS > 0) {
      const pids = cluster.instances.map((instance) => instance.child.pid);
      const start = pids.map(rssMb);
      const samples: number[][] = [start];
      console.log(`\nSoak: the same mix through the cluster for ${SOAK_SECONDS} s; RSS sampled every 10 s`);
      const soakTally = await drive(proxied, readers, SOAK_SECONDS, () => samples.push(pids.map(rssMb)));
      const end = pids.map(rssMb);
      soak = cluster.instances.map(
        (instance, i) => `${instance.name}: RSS ${start[i]} MB → ${end[i]} MB (max ${Math.max(...samples.map((s) => s[i]!), end[i]!)} MB)`,
      );
      report('soak', soakTally);
      for (const line of soak) console.log(`  ${line}`);
    }
  } finally {
    await cluster.stop();
  }

  // --profile: the baseline instance writes a V8 CPU profile (open it in Chrome's DevTools) when it stops.
  const profiling = PROFILE ? ['--cpu-prof', `--cpu-prof-dir=${path.resolve('.data/profiles')}`] : [];
  const single = await startInstance('single', 0, { ...env, LAMPLIGHT_TRUST_PROXY: '' }, false, profiling);
  const direct = new URL(`http://127.0.0.1:${single.port}`);
  console.log(`\nBaseline: one instance, no proxy, same mix`);
  let singleRows: ReturnType<typeof report>;
  try {
    await drive(direct, readers, WARM_UP_SECONDS);
    singleRows = report('single instance', await drive(direct, readers, SECONDS));
  } finally {
    await stopChild(single.child);
  }

  console.log('\nCluster ÷ single instance (requests/s ratio > 1: the cluster serves more; p99 ratio < 1: faster):');
  for (const kind of Object.keys(clusterRows) as Kind[]) {
    const c = clusterRows[kind];
    const s = singleRows[kind];
    console.log(`  ${kind.padEnd(11)} requests/s ×${(c.rps / s.rps).toFixed(2)}  p99 ×${(c.p99 / s.p99).toFixed(2)}`);
  }
  const within = (['empty pull', 'small push'] as Kind[]).every((kind) => clusterRows[kind].p99 < 100);
  console.log(`\nGoal p99 < 100 ms for empty pulls and small pushes through the cluster: ${within ? 'met' : 'NOT met'}`);
  agent.destroy();
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});

async function profileBaseline(env: Record<string, string | undefined>, readers: { quiet: Reader[]; writers: Reader[]; heavy: Reader[] }): Promise<void> {
  const single = await startInstance('single', 0, { ...env, LAMPLIGHT_TRUST_PROXY: '' }, false, ['--cpu-prof', `--cpu-prof-dir=${path.resolve('.data/profiles')}`]);
  const direct = new URL(`http://127.0.0.1:${single.port}`);
  try {
    await Promise.all(
      readers.quiet.map(async (reader) => {
        reader.cursor = (JSON.parse((await send(direct, 'GET', '/api/sync/pull', reader.token)).text) as { cursor: string }).cursor;
      }),
    );
    await drive(direct, readers, WARM_UP_SECONDS);
    report('single instance (profiled)', await drive(direct, readers, SECONDS));
  } finally {
    await stopChild(single.child, 30_000);
  }
  agent.destroy();
}
