/**
 * `npm run bench:first-sync`: a fresh device signs in to a journal of 10,000 books. Timed from the
 * sign-in click to the library showing all of them, in Debian's Chromium against the production
 * build. The baseline, in the same browser and run: a plain client fetches the same pull pages
 * (the largest the contract allows) and puts each page's rows into IndexedDB in one transaction.
 * Rounds alternate; prints both medians and the ratio (goal ≤ 1.5).
 */

import type { Browser } from 'playwright-core';

import { MAX_PULL_LIMIT } from '../shared/api/sync';
import { launchBrowser } from '../spec/e2e/support/browser';
import { registerThroughApi } from '../spec/e2e/support/reader';
import { SyncClient } from '../spec/support/sync-client';
import { startTestServer } from '../spec/support/test-server';
import { median } from './bench-support/seed-books';
import { seedServerBooks } from './bench-support/seed-server';

const BOOKS = 10_000;
const ROUNDS = 3;

/** The app's time, and how long of it the sign-in request took from sent to answered. */
async function appRound(browser: Browser, baseUrl: string, email: string, password: string): Promise<{ ms: number; signInMs: number }> {
  const context = await browser.newContext();
  const page = await context.newPage();
  let signInMs = NaN;
  page.on('requestfinished', (request) => {
    if (new URL(request.url()).pathname === '/api/auth/login') signInMs = request.timing().responseEnd;
  });
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  const start = performance.now();
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL(`${baseUrl}/today`, { waitUntil: 'commit', timeout: 300_000 });
  await page.getByRole('link', { name: 'Library' }).first().click({ timeout: 300_000 });
  await page.getByText(`${BOOKS} books`, { exact: true }).waitFor({ timeout: 300_000 });
  const elapsed = performance.now() - start;
  await context.close();
  return { ms: elapsed, signInMs };
}

async function baselineRound(browser: Browser, baseUrl: string, accessToken: string): Promise<number> {
  const context = await browser.newContext();
  const page = await context.newPage();
  await page.goto(`${baseUrl}/api/health`); // the origin, without the app running
  const elapsed = await page.evaluate(
    async ({ accessToken, limit, books }) => {
      const db: IDBDatabase = await new Promise((resolve, reject) => {
        const open = indexedDB.open('bench-first-sync', 1);
        open.onupgradeneeded = () => open.result.createObjectStore('books', { keyPath: 'id' });
        open.onsuccess = () => resolve(open.result);
        open.onerror = () => reject(open.error);
      });
      const start = performance.now();
      let since: string | undefined;
      let stored = 0;
      for (;;) {
        const query = new URLSearchParams({ limit: String(limit), ...(since ? { since } : {}) });
        const res = await fetch(`/api/sync/pull?${query}`, { headers: { authorization: `Bearer ${accessToken}` } });
        const body = (await res.json()) as { changes: { rowId: string; field: string; value: unknown }[]; cursor: string; hasMore: boolean };
        const rows = new Map<string, Record<string, unknown>>();
        for (const change of body.changes) rows.set(change.rowId, { ...(rows.get(change.rowId) ?? { id: change.rowId }), [change.field]: change.value });
        const tx = db.transaction('books', 'readwrite');
        for (const row of rows.values()) tx.objectStore('books').put(row);
        await new Promise((resolve, reject) => {
          tx.oncomplete = resolve;
          tx.onerror = () => reject(tx.error);
        });
        stored += rows.size;
        since = body.cursor;
        if (!body.hasMore) break;
      }
      const elapsed = performance.now() - start;
      db.close();
      if (stored < books) throw new Error(`the baseline stored ${stored} books`);
      return elapsed;
    },
    { accessToken, limit: MAX_PULL_LIMIT, books: BOOKS },
  );
  await context.close();
  return elapsed;
}

async function main(): Promise<void> {
  const server = await startTestServer({ withApp: true });
  const browser = await launchBrowser();
  const app: number[] = [];
  const signIn: number[] = [];
  const baseline: number[] = [];
  try {
    const reader = await registerThroughApi(server.baseUrl, 'Bench First Sync');
    await seedServerBooks(new SyncClient(server.baseUrl, reader.accessToken), BOOKS);
    for (let round = 0; round < ROUNDS; round++) {
      const appFirst = round % 2 === 0;
      const appOnce = async () => {
        const { ms, signInMs } = await appRound(browser, server.baseUrl, reader.user.email, reader.password);
        app.push(ms);
        signIn.push(signInMs);
      };
      if (appFirst) await appOnce();
      baseline.push(await baselineRound(browser, server.baseUrl, reader.accessToken));
      if (!appFirst) await appOnce();
    }
  } finally {
    await browser.close();
    await server.close();
  }
  console.log(`bench-first-sync: ${BOOKS.toLocaleString('en')} books, sign-in → the library shows them, vs fetch + put per page (${ROUNDS} alternating rounds)`);
  console.log(`  app      median ${(median(app) / 1000).toFixed(2)} s   (${app.map((ms) => (ms / 1000).toFixed(2)).join(', ')})`);
  console.log(`  baseline median ${(median(baseline) / 1000).toFixed(2)} s   (${baseline.map((ms) => (ms / 1000).toFixed(2)).join(', ')})`);
  console.log(`  ratio ${(median(app) / median(baseline)).toFixed(2)}`);
  // The baseline starts with a token, the app with its sign-in request, shown apart: it once took
  // 4–8 s here, queued behind the service worker's install downloads (the server answered in 20 ms).
  const afterSignIn = app.map((ms, n) => ms - signIn[n]!);
  console.log(
    `  of the app's time, the sign-in answer took median ${(median(signIn) / 1000).toFixed(2)} s; without it ${(median(afterSignIn) / 1000).toFixed(2)} s, ratio ${(median(afterSignIn) / median(baseline)).toFixed(2)}`,
  );
}

main().then(
  () => process.exit(0),
  (err: unknown) => {
    console.error(err);
    process.exit(1);
  },
);
