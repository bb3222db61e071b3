/**
 * `npm run bench:library`: is the library fluid at 10,000 books? In Debian's Chromium against the
 * production build, the same steps are timed for a reader with 100 books (the baseline) and one
 * with 10,000, in one run: opening the library, a search keystroke, sorting, turning a page,
 * switching to the covers view. Prints both times and their ratio.
 */
import { performance } from 'node:perf_hooks';

import type { Page } from 'playwright-core';

import { launchBrowser } from '../spec/e2e/support/browser';
import { registerThroughApi, signInThroughUi } from '../spec/e2e/support/reader';
import { startTestServer } from '../spec/support/test-server';
import { seedBooks } from './bench-support/seed-books';

const SIZES = [100, 10_000];

async function time(work: () => Promise<unknown>): Promise<number> {
  const start = performance.now();
  await work();
  return performance.now() - start;
}

async function measure(page: Page, baseUrl: string, count: number): Promise<Record<string, number>> {
  const rows = page.locator('table[aria-label="Books"] tr.mat-mdc-row');
  const open = await time(async () => {
    await page.goto(`${baseUrl}/library`);
    await rows.first().waitFor();
    await page.getByText(`${count} books`, { exact: true }).waitFor();
  });
  const search = await time(async () => {
    await page.getByLabel('Search the library').fill('heron 7');
    await page.locator('p.count', { hasText: ' of ' }).waitFor();
  });
  await page.getByLabel('Search the library').fill('');
  await page.getByText(`${count} books`, { exact: true }).waitFor();
  const sort = await time(async () => {
    const first = await rows.first().locator('a.title').textContent();
    await page.getByRole('button', { name: 'Title' }).click();
    await page.waitForFunction((before) => document.querySelector('tr.mat-mdc-row a.title')?.textContent !== before, first);
  });
  const nextPage = await time(async () => {
    const first = await rows.first().locator('a.title').textContent();
    await page.getByRole('button', { name: 'Next page' }).click();
    await page.waitForFunction((before) => document.querySelector('tr.mat-mdc-row a.title')?.textContent !== before, first);
  });
  const covers = await time(async () => {
    await page.getByLabel('As covers').click();
    await page.locator('ul.covers li').first().waitFor();
  });
  await page.getByLabel('As a table').click();
  return { open, search, sort, nextPage, covers };
}

async function main(): Promise<void> {
  const server = await startTestServer({ withApp: true });
  const browser = await launchBrowser();
  const results: Record<number, Record<string, number>> = {};
  try {
    for (const count of SIZES) {
      const reader = await registerThroughApi(server.baseUrl, `Bench Reader ${count}`);
      const context = await browser.newContext();
      const page = await context.newPage();
      await signInThroughUi(page, server.baseUrl, reader.user.email, reader.password);
      await seedBooks(page, `lamplight-journal-${reader.user.id}`, count);
      await measure(page, server.baseUrl, count); // warm-up: code and caches
      results[count] = await measure(page, server.baseUrl, count);
      await context.close();
    }
  } finally {
    await browser.close();
    await server.close();
  }
  const [small, large] = SIZES as [number, number];
  console.log(`bench-library: the library in Chromium with ${small} and ${large.toLocaleString('en')} books (ms, after one warm-up)`);
  for (const step of Object.keys(results[small]!)) {
    const a = results[small]![step]!;
    const b = results[large]![step]!;
    console.log(`  ${step.padEnd(9)} ${a.toFixed(0).padStart(6)} ms  ${b.toFixed(0).padStart(6)} ms  ratio ${(b / a).toFixed(2)}`);
  }
}

main().then(
  () => process.exit(0),
  (err: unknown) => {
    console.error(err);
    process.exit(1);
  },
);
