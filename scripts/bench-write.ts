/**
 * `npm run bench:write`: how long a status change takes from the reader's choice in the library to
 * its commit in IndexedDB, at 28 and 10,000 books, in Debian's Chromium against the production
 * build. The baseline, in the same page, is the least such a write can cost: one `put` of the book
 * and one `put` into an outbox, in one transaction (a database of its own with as many books).
 * Both are detected the same way (a read-only transaction in a worker that sees the new status), in
 * rounds whose order alternates; prints the medians, p95s and the p95 ratio (goal ≤ 3).
 */
import type { Page } from 'playwright-core';

import { launchBrowser } from '../spec/e2e/support/browser';
import { registerThroughApi, signInThroughUi } from '../spec/e2e/support/reader';
import { waitForOfflineReady } from '../spec/e2e/support/service-worker';
import { startTestServer } from '../spec/support/test-server';
import { median, percentile, seedBooks } from './bench-support/seed-books';

const SIZES = [28, 10_000];
const ROUNDS = 6;
const PER_ROUND = 8;
const BASELINE_DB = 'bench-write-baseline';
const STATUSES = ['tbr', 'reading', 'paused', 'finished', 'dnf'];

/** The baseline's database: the same books, and an outbox as the app's (auto-increment key). */
async function makeBaseline(page: Page, count: number): Promise<void> {
  await page.evaluate(async (name) => {
    await new Promise<void>((resolve, reject) => {
      const open = indexedDB.open(name, 1);
      open.onupgradeneeded = () => {
        open.result.createObjectStore('books', { keyPath: 'id' });
        open.result.createObjectStore('outbox', { keyPath: 'seq', autoIncrement: true });
      };
      open.onsuccess = () => (open.result.close(), resolve());
      open.onerror = () => reject(open.error);
    });
  }, BASELINE_DB);
  await seedBooks(page, BASELINE_DB, count);
}

/**
 * The detector: a worker that reads the book in read-only transactions until one sees the new
 * status (a read-only transaction over `books` waits for a write to it that began earlier), and
 * answers when (`timeOrigin + now()`, comparable across threads). A worker, not the page: the
 * page's main thread is busy right after the app's commit (its live queries and re-render), and a
 * detector there could time that work as well. (It did not explain why 28 books measure slower
 * than 10,000: see scripts/benchmarks.md, bench:write.)
 */
const DETECTOR = `
  const dbs = new Map();
  const open = (name) => dbs.get(name) ?? new Promise((resolve, reject) => {
    const request = indexedDB.open(name);
    request.onsuccess = () => resolve(request.result);
    request.onerror = () => reject(request.error);
  });
  const read = (db, id) => new Promise((resolve, reject) => {
    const get = db.transaction('books', 'readonly').objectStore('books').get(id);
    get.onsuccess = () => resolve(get.result);
    get.onerror = () => reject(get.error);
  });
  onmessage = async ({ data: { name, id, status } }) => {
    const db = await open(name);
    dbs.set(name, db);
    while ((await read(db, id))?.status !== status) {}
    postMessage(performance.timeOrigin + performance.now());
  };`;

/** Starts the detector in the page (the bench's context bypasses the app's CSP for this blob worker). */
async function startDetector(page: Page): Promise<void> {
  await page.evaluate((source) => {
    const url = URL.createObjectURL(new Blob([source], { type: 'text/javascript' }));
    (window as unknown as { benchDetector: Worker }).benchDetector = new Worker(url);
  }, DETECTOR);
}

/**
 * In the page: starts a write, lets queued microtasks run (Dexie opens its transaction in one, so
 * the detector's first read does not queue ahead of it), then asks the detector when a read sees
 * `status`. Returns the milliseconds from the start of the write.
 */
async function timeWrite(page: Page, kind: 'app' | 'baseline', dbName: string, row: number, status: string): Promise<number> {
  return page.evaluate(
    async ({ kind, dbName, row, status, baselineDb }) => {
      const open = (name: string) =>
        new Promise<IDBDatabase>((resolve, reject) => {
          const request = indexedDB.open(name);
          request.onsuccess = () => resolve(request.result);
          request.onerror = () => reject(request.error);
        });
      const detector = (window as unknown as { benchDetector: Worker }).benchDetector;
      let id: string;
      let start: number;
      if (kind === 'app') {
        const rows = document.querySelectorAll('table[aria-label="Books"] tr.mat-mdc-row');
        const tr = rows[row % rows.length]!;
        id = tr.querySelector('a.title')!.getAttribute('href')!.split('/').pop()!;
        const select = tr.querySelector('select.quick-status') as HTMLSelectElement;
        start = performance.now();
        select.value = status;
        select.dispatchEvent(new Event('change', { bubbles: true }));
      } else {
        const db = await open(baselineDb);
        const ids = await new Promise<IDBValidKey[]>((resolve) => {
          const keys = db.transaction('books').objectStore('books').getAllKeys(null, 50);
          keys.onsuccess = () => resolve(keys.result);
        });
        id = String(ids[row % ids.length]);
        const book = await new Promise<Record<string, unknown>>((resolve) => {
          const get = db.transaction('books').objectStore('books').get(id);
          get.onsuccess = () => resolve(get.result as Record<string, unknown>);
        });
        start = performance.now();
        const tx = db.transaction(['books', 'outbox'], 'readwrite');
        tx.objectStore('books').put({ ...book, status });
        tx.objectStore('outbox').put({ id: crypto.randomUUID(), collection: 'books', rowId: id, field: 'status', value: status, hlc: 'x' });
        tx.oncomplete = () => db.close();
      }
      await new Promise((resolve) => {
        const channel = new MessageChannel();
        channel.port1.onmessage = resolve;
        channel.port2.postMessage(null);
      });
      const committed = await new Promise<number>((resolve) => {
        detector.onmessage = ({ data }) => resolve(data as number);
        detector.postMessage({ name: kind === 'app' ? dbName : baselineDb, id, status });
      });
      return committed - performance.timeOrigin - start;
    },
    { kind, dbName, row, status, baselineDb: BASELINE_DB },
  );
}

/** Lets the page finish what a write set off (live queries, the library's re-render, a sync). */
async function settle(page: Page): Promise<void> {
  await page.waitForTimeout(150);
  await page.evaluate(() => new Promise((resolve) => requestAnimationFrame(() => requestAnimationFrame(resolve))));
}

async function measure(page: Page, dbName: string): Promise<{ app: number[]; baseline: number[] }> {
  const times = { app: [] as number[], baseline: [] as number[] };
  let turn = 0;
  for (let round = 0; round < ROUNDS; round++) {
    const order: ('app' | 'baseline')[] = round % 2 === 0 ? ['app', 'baseline'] : ['baseline', 'app'];
    for (let n = 0; n < PER_ROUND; n++) {
      for (const kind of order) {
        turn++;
        times[kind].push(await timeWrite(page, kind, dbName, turn, STATUSES[turn % STATUSES.length]!));
        await settle(page);
      }
    }
  }
  return times;
}

async function main(): Promise<void> {
  const server = await startTestServer({ withApp: true });
  const browser = await launchBrowser();
  const lines: string[] = [];
  try {
    for (const count of SIZES) {
      const reader = await registerThroughApi(server.baseUrl, `Bench Writer ${count}`);
      const context = await browser.newContext({ bypassCSP: true }); // the detector is a blob worker
      const page = await context.newPage();
      await signInThroughUi(page, server.baseUrl, reader.user.email, reader.password);
      const dbName = `lamplight-journal-${reader.user.id}`;
      await seedBooks(page, dbName, count);
      await makeBaseline(page, count);
      await page.goto(`${server.baseUrl}/library`);
      await page.getByText(`${count} books`, { exact: true }).waitFor();
      // The service worker installs and fetches every file after sign-in: let it finish first.
      await waitForOfflineReady(page, server.baseUrl, 120_000);
      await startDetector(page);
      await measure(page, dbName); // warm-up: code, caches, the JIT
      const { app, baseline } = await measure(page, dbName);
      const ratio = percentile(app, 0.95) / percentile(baseline, 0.95);
      lines.push(
        `  ${count.toLocaleString('en').padStart(6)} books  app p50 ${median(app).toFixed(1).padStart(6)} p95 ${percentile(app, 0.95).toFixed(1).padStart(6)} ms` +
          `   baseline p50 ${median(baseline).toFixed(1).padStart(5)} p95 ${percentile(baseline, 0.95).toFixed(1).padStart(5)} ms   p95 ratio ${ratio.toFixed(2)}`,
      );
      await context.close();
    }
  } finally {
    await browser.close();
    await server.close();
  }
  console.log(`bench-write: a status change in the library → committed in IndexedDB, vs one put + one outbox put (${ROUNDS * PER_ROUND} each, alternating)`);
  for (const line of lines) console.log(line);
}

main().then(
  () => process.exit(0),
  (err: unknown) => {
    console.error(err);
    process.exit(1);
  },
);
