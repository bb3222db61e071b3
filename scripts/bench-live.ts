/**
 * `npm run bench:live`: how fast a change reaches another device through live updates, and what
 * idle streams cost a server.
 *
 * 1. Two real server processes on one PostgreSQL (as behind a load balancer). Device A pushes to
 *    the first; device B keeps a stream open on the second and runs the shared sync cycle when
 *    poked. Measured: from the start of A's push to the change being in B's store, over 100
 *    changes, against A's own sync cycle (push + pull) measured in the same run — the floor for
 *    any device — and against the engine's minute-long periodic pull, the way without streams.
 * 2. The same with device B a real browser (Debian Chromium) running the built app on the second
 *    process: from the start of A's push to the change in B's IndexedDB.
 * 3. 500 idle streams (25 readers × 20) on the second process: its resident memory and CPU over
 *    one heartbeat period (25 s) before and after.
 */
import { existsSync, mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';

import { quantile } from 'simple-statistics';

import { DevInbox } from '../sync-server/src/mail/dev-inbox';
import { MemoryDevice } from '../spec/support/memory-device';
import { processUsage, registeredReader, serverProcessEnv, startServerProcess, type ServerProcess } from '../spec/support/server-process';
import { SyncEventStream } from '../spec/support/sync-event-stream';
import { launchBrowser } from '../spec/e2e/support/browser';
import { arrivalInIndexedDb } from '../spec/e2e/support/indexed-db';
import { signInThroughUi } from '../spec/e2e/support/reader';

/** The production build (`npm run build`), served by the server processes for the browser part. */
const APP_DIR = path.resolve(__dirname, '../../app/browser');
const PASSWORD = 'amber lanterns over the quiet quay';

const CHANGES = 100;
const WARM_UP = 5;
const IDLE_READERS = 25;
const STREAMS_PER_READER = 20;
const HEARTBEAT_WINDOW_MS = 25_000;
const PERIODIC_PULL_MS = 60_000;

const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));
const ms = (value: number) => `${value.toFixed(1)} ms`;

/** Device B: pulls whenever its stream pokes, one cycle at a time, and says when a title arrived. */
function followingDevice(device: MemoryDevice) {
  let running: Promise<void> | null = null;
  let again = false;
  const waiters: { row: string; title: string; resolve: (at: number) => void }[] = [];
  const check = () => {
    for (const waiter of [...waiters]) {
      if (device.rows.get(`books/${waiter.row}`)?.['title'] === waiter.title) {
        waiters.splice(waiters.indexOf(waiter), 1);
        waiter.resolve(performance.now());
      }
    }
  };
  return {
    poked(): void {
      if (running) {
        again = true;
        return;
      }
      running = (async () => {
        do {
          again = false;
          await device.sync();
          check();
        } while (again);
        running = null;
      })();
    },
    arrival(row: string, title: string): Promise<number> {
      return new Promise((resolve) => {
        waiters.push({ row, title, resolve });
        check();
      });
    },
  };
}

async function latency(first: ServerProcess, second: ServerProcess): Promise<void> {
  const token = await registeredReader(first.baseUrl, `live-bench-${Date.now()}@example.com`);
  const deviceA = new MemoryDevice(first.baseUrl, token, 'bench-A');
  const deviceB = new MemoryDevice(second.baseUrl, token, 'bench-B');
  const follower = followingDevice(deviceB);
  const stream = await SyncEventStream.open(second.baseUrl, token);
  let seen = 0;
  const watch = setInterval(() => {
    for (; seen < stream.events.length; seen++) if (stream.events[seen]!.event === 'sync') follower.poked();
  }, 1);

  const endToEnd: number[] = [];
  const ownCycle: number[] = [];
  const row = '5e7a0000-0000-4000-8000-000000000001';
  for (let n = 0; n < WARM_UP + CHANGES; n++) {
    const title = `Live volume ${n}`;
    deviceA.write('books', row, { title });
    const arrived = follower.arrival(row, title);
    const started = performance.now();
    await deviceA.sync();
    const pushed = performance.now();
    const at = await Promise.race([arrived, sleep(10_000).then(() => NaN)]);
    if (n >= WARM_UP) {
      endToEnd.push(at - started);
      ownCycle.push(pushed - started);
    }
    await sleep(20);
  }
  clearInterval(watch);
  stream.close();

  report("Push on instance A → change in device B's store (a Node device on instance B)", endToEnd, quantile(ownCycle, 0.5));
}

/** Prints one latency sample with its baselines. */
function report(label: string, samples: readonly number[], baseline: number): void {
  const arrived = samples.filter((value) => !Number.isNaN(value));
  const p50 = quantile(arrived, 0.5);
  const p95 = quantile(arrived, 0.95);
  console.log(`\n${label}, ${samples.length} changes`);
  console.log(`  p50 ${ms(p50)}   p95 ${ms(p95)}   max ${ms(Math.max(...arrived))}   not arrived in 10 s: ${samples.length - arrived.length}`);
  console.log(`  goal p95 < 1000 ms: ${p95 < 1000 ? 'met' : 'NOT met'}`);
  console.log(`  baseline, A's own sync cycle (push + pull), p50 ${ms(baseline)}: end-to-end p50 is ${(p50 / baseline).toFixed(2)}× that`);
  console.log(
    `  without streams (pull every ${PERIODIC_PULL_MS / 1000} s while visible) a change waits ${PERIODIC_PULL_MS / 2000} s on average: ${(PERIODIC_PULL_MS / 2 / p50).toFixed(0)}× the p50 here`,
  );
}

/** Device B is the app in Chromium, signed in on the second process; A is a Node device on the first. */
async function browserLatency(first: ServerProcess, second: ServerProcess): Promise<void> {
  const email = `live-browser-${Date.now()}@example.com`;
  const token = await registeredReader(first.baseUrl, email, PASSWORD);
  const userId = JSON.parse(Buffer.from(token.split('.')[1]!, 'base64url').toString()).sub as string;
  const browser = await launchBrowser();
  try {
    const page = await (await browser.newContext()).newPage();
    await signInThroughUi(page, second.baseUrl, email, PASSWORD);
    await page.goto(`${second.baseUrl}/library`);
    const deviceA = new MemoryDevice(first.baseUrl, token, 'bench-A');
    const row = '5e7a0000-0000-4000-8000-000000000002';
    const endToEnd: number[] = [];
    const ownCycle: number[] = [];
    for (let n = 0; n < WARM_UP + CHANGES; n++) {
      const title = `Browser volume ${n}`;
      deviceA.write('books', row, { title });
      const arrived = arrivalInIndexedDb(page, { userId, store: 'books', rowId: row, field: 'title', value: title, timeoutMs: 10_000 }).catch(() => NaN);
      const started = Date.now();
      await deviceA.sync();
      const pushed = Date.now();
      const at = await arrived;
      if (n >= WARM_UP) {
        endToEnd.push(at - started);
        ownCycle.push(pushed - started);
      }
      await sleep(20);
    }
    report("Push on instance A → change in the browser's IndexedDB (the app on instance B)", endToEnd, quantile(ownCycle, 0.5));
  } finally {
    await browser.close();
  }
}

async function idleStreams(first: ServerProcess, second: ServerProcess): Promise<void> {
  const pid = second.child.pid!;
  await sleep(1000);
  const quietStart = await processUsage(pid);
  await sleep(HEARTBEAT_WINDOW_MS);
  const quietEnd = await processUsage(pid);

  const tokens: string[] = [];
  for (let n = 0; n < IDLE_READERS; n++) tokens.push(await registeredReader(first.baseUrl, `idle-${n}-${Date.now()}@example.com`));
  const streams: SyncEventStream[] = [];
  for (const token of tokens) {
    for (let n = 0; n < STREAMS_PER_READER; n++) streams.push(await SyncEventStream.open(second.baseUrl, token));
  }
  await Promise.all(streams.map((stream) => stream.nextSync(0, 30_000)));
  const refused = streams.filter((stream) => stream.status !== 200).length;
  await sleep(2000);
  const openStart = await processUsage(pid);
  await sleep(HEARTBEAT_WINDOW_MS);
  const openEnd = await processUsage(pid);
  const heartbeats = streams.reduce((n, stream) => n + stream.comments.length, 0);
  streams.forEach((stream) => stream.close());

  const cpuShare = (start: { cpuMs: number }, end: { cpuMs: number }) => ((end.cpuMs - start.cpuMs) / HEARTBEAT_WINDOW_MS) * 100;
  const count = streams.length - refused;
  console.log(`\n${count} idle streams on one instance (${IDLE_READERS} readers × ${STREAMS_PER_READER}; ${refused} refused), over ${HEARTBEAT_WINDOW_MS / 1000} s`);
  console.log(
    `  resident memory  ${(quietEnd.rssKb / 1024).toFixed(1)} MiB → ${(openEnd.rssKb / 1024).toFixed(1)} MiB (+${((openEnd.rssKb - quietEnd.rssKb) / count).toFixed(1)} KiB a stream)`,
  );
  console.log(
    `  CPU              ${cpuShare(quietStart, quietEnd).toFixed(2)} % → ${cpuShare(openStart, openEnd).toFixed(2)} % of one core (${heartbeats} heartbeats received)`,
  );
}

async function main(): Promise<void> {
  const databaseUrl = process.env['DATABASE_URL'];
  if (!databaseUrl) throw new Error('DATABASE_URL is not set: run through `npm run bench:live`');
  const inbox = new DevInbox(mkdtempSync(path.join(tmpdir(), 'lamplight-bench-mail-')));
  const withApp = existsSync(path.join(APP_DIR, 'index.html'));
  const env = serverProcessEnv(databaseUrl, await inbox.listen(0), withApp ? { LAMPLIGHT_APP_DIR: APP_DIR } : {});
  // One at a time: both migrate the fresh database at start.
  const first = await startServerProcess(env);
  const second = await startServerProcess(env);
  try {
    await latency(first, second);
    if (withApp) await browserLatency(first, second);
    else console.log('\n(no built app in dist/app/browser: the browser part is skipped; `npm run bench:live` builds it)');
    await idleStreams(first, second);
  } finally {
    first.child.kill('SIGTERM');
    second.child.kill('SIGTERM');
    await Promise.all([first.exited, second.exited]);
    await inbox.close();
  }
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
