/**
 * Where a first sync's time goes (issue 17): one app round of `bench:first-sync` (a fresh device
 * signs in to 10,000 books and opens the Library until it shows them all) with a CPU profile
 * (CDP `Profiler`), printing the timeline of the page's pull requests and IndexedDB read-write
 * transactions (created → complete, page time in ms) and how many of each IndexedDB request it
 * made. Build first (`NG_BUILD_DEBUG_OPTIMIZE=1 npx ng build --configuration production
 * --output-path /tmp/debug-build` keeps names readable; `LAMPLIGHT_PROFILE_APP=/tmp/debug-build/browser`
 * serves it), then `npx tsc -p sync-server/tsconfig.json` and
 * `DATABASE_URL=$(bash scripts/db.sh url lamplight_bench) node dist/node/scripts/profile-first-sync.js`
 * (a fresh database: `bash scripts/db.sh fresh-db lamplight_bench`). The profile goes to
 * `LAMPLIGHT_PROFILE_OUT` (default /tmp/first-sync.cpuprofile), for DevTools.
 */
import { writeFileSync } from 'node:fs';

import type { Page } from 'playwright-core';

import { launchBrowser } from '../spec/e2e/support/browser';
import { registerThroughApi } from '../spec/e2e/support/reader';
import { SyncClient } from '../spec/support/sync-client';
import { startTestServer } from '../spec/support/test-server';
import { seedServerBooks } from './bench-support/seed-server';

const BOOKS = 10_000;
const OUT = process.env['LAMPLIGHT_PROFILE_OUT'] ?? '/tmp/first-sync.cpuprofile';

/** Counts the page's IndexedDB requests by store and keeps when each read-write transaction was created and completed. */
function watchIndexedDb(): void {
  const counts: Record<string, number> = {};
  const spans: string[] = [];
  Object.assign(globalThis, { benchIdb: { counts, spans } });
  const wrap = (proto: object, kind: string, names: readonly string[]) => {
    for (const name of names) {
      const original = (proto as Record<string, (...args: unknown[]) => unknown>)[name]!;
      (proto as Record<string, unknown>)[name] = function (this: { name: string }, ...args: unknown[]) {
        const key = `${kind}.${name} ${this.name}`;
        counts[key] = (counts[key] ?? 0) + 1;
        return original.apply(this, args);
      };
    }
  };
  wrap(IDBObjectStore.prototype, 'store', ['get', 'getAll', 'getAllKeys', 'put', 'add', 'delete', 'count', 'openCursor']);
  wrap(IDBIndex.prototype, 'index', ['get', 'getAll', 'getAllKeys', 'count', 'openCursor', 'openKeyCursor']);
  const transaction = IDBDatabase.prototype.transaction;
  IDBDatabase.prototype.transaction = function (this: IDBDatabase, ...args: Parameters<IDBDatabase['transaction']>) {
    const tx = transaction.apply(this, args);
    const stores = [args[0]].flat();
    counts[`transaction ${args[1] ?? 'readonly'}`] = (counts[`transaction ${args[1] ?? 'readonly'}`] ?? 0) + 1;
    if (args[1] === 'readwrite') {
      const created = performance.now();
      const what = stores.length > 3 ? `${stores.length} stores` : stores.join(', ');
      tx.addEventListener('complete', () => spans.push(`${created.toFixed(0)} → ${performance.now().toFixed(0)}  readwrite ${what}`));
    }
    return tx;
  };
}

async function report(page: Page): Promise<void> {
  const { counts, spans, requests } = await page.evaluate(() => {
    const { counts, spans } = (globalThis as unknown as { benchIdb: { counts: Record<string, number>; spans: string[] } }).benchIdb;
    const requests = performance
      .getEntriesByType('resource')
      .filter((entry) => entry.name.includes('/api/'))
      .map((entry) => `${entry.startTime.toFixed(0)} → ${(entry as PerformanceResourceTiming).responseEnd.toFixed(0)}  ${new URL(entry.name).pathname}`);
    return { counts, spans, requests };
  });
  console.log([...spans, ...requests].sort((a, b) => parseFloat(a) - parseFloat(b)).join('\n'));
  console.log('IndexedDB requests:');
  for (const [key, n] of Object.entries(counts).sort((a, b) => b[1] - a[1])) console.log(`  ${String(n).padStart(6)}  ${key}`);
}

async function main(): Promise<void> {
  const app = process.env['LAMPLIGHT_PROFILE_APP'];
  const server = await startTestServer({ withApp: true, env: app ? { LAMPLIGHT_APP_DIR: app } : {} });
  const browser = await launchBrowser();
  try {
    const reader = await registerThroughApi(server.baseUrl, 'Profile First Sync');
    await seedServerBooks(new SyncClient(server.baseUrl, reader.accessToken), BOOKS);
    const context = await browser.newContext();
    const page = await context.newPage();
    await page.addInitScript(watchIndexedDb);
    await page.goto(`${server.baseUrl}/sign-in`);
    await page.getByLabel('E-mail').fill(reader.user.email);
    await page.getByLabel('Password').fill(reader.password);
    const cdp = await context.newCDPSession(page);
    await cdp.send('Profiler.enable');
    await cdp.send('Profiler.setSamplingInterval', { interval: 500 });
    await cdp.send('Profiler.start');
    const start = performance.now();
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('link', { name: 'Library' }).first().click({ timeout: 300_000 });
    await page.getByText(`${BOOKS} books`, { exact: true }).waitFor({ timeout: 300_000 });
    console.log(`the Library showed ${BOOKS} books ${(performance.now() - start).toFixed(0)} ms after the click`);
    const { profile } = await cdp.send('Profiler.stop');
    writeFileSync(OUT, JSON.stringify(profile));
    await report(page);
    await context.close();
  } finally {
    await browser.close();
    await server.close();
  }
}

main().then(
  () => process.exit(0),
  (err: unknown) => {
    console.error(err);
    process.exit(1);
  },
);
