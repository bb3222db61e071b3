/**
 * `npm run bench:export`: Export everything for a reader with 10,000 books (and a reading and a
 * session for each), in Debian's Chromium against the production build, after one warm-up run:
 * the time from the click to the file, the page's peak JavaScript heap and main-thread long
 * tasks. Against the same steps for 100 books in the same run, for the ratio.
 */
import { readFile } from 'node:fs/promises';

import type { Page } from 'playwright-core';

import { launchBrowser } from '../spec/e2e/support/browser';
import { registerThroughApi, signInThroughUi } from '../spec/e2e/support/reader';
import { startTestServer } from '../spec/support/test-server';
import { inventedBook, measureStep, printStep, watchLongTasks, type StepMeasure } from './bench-in-page';

const SIZES = [100, 10_000];

/** Writes books, readings and sessions straight into the reader's IndexedDB, each field with a clock. */
async function seedJournal(page: Page, userId: string, books: { title: string; author: string }[]): Promise<void> {
  await page.evaluate(
    async ({ name, books }) => {
      const db: IDBDatabase = await new Promise((resolve, reject) => {
        const open = indexedDB.open(name);
        open.onsuccess = () => resolve(open.result);
        open.onerror = () => reject(open.error);
      });
      const tx = db.transaction(['books', 'readings', 'sessions'], 'readwrite');
      const stamp = (row: Record<string, unknown>, n: number) => {
        const clock = `${String(1_764_633_600_000 + n).padStart(15, '0')}:00000:bench`;
        return {
          ...row,
          _hlc: Object.fromEntries(
            Object.keys(row)
              .filter((key) => key !== 'id')
              .map((key) => [key, clock]),
          ),
        };
      };
      books.forEach(({ title, author }, n) => {
        const bookId = crypto.randomUUID();
        tx.objectStore('books').put(
          stamp(
            {
              id: bookId,
              title,
              authors: [author],
              format: 'print',
              status: 'finished',
              rating: ((n % 10) + 1) / 2,
              pageCount: 200 + (n % 300),
              tags: ['bench'],
              deleted: false,
            },
            n,
          ),
        );
        tx.objectStore('readings').put(
          stamp({ id: crypto.randomUUID(), bookId, startedOn: '2026-01-02', finishedOn: '2026-01-20', review: `Notes on ${title}.`, deleted: false }, n),
        );
        tx.objectStore('sessions').put(
          stamp(
            {
              id: crypto.randomUUID(),
              bookId,
              startedAt: '2026-01-02T20:00:00.000Z',
              endedAt: '2026-01-02T20:40:00.000Z',
              activeMinutes: 40,
              fromPosition: 1,
              toPosition: 30,
              deleted: false,
            },
            n,
          ),
        );
      });
      await new Promise((resolve, reject) => {
        tx.oncomplete = resolve;
        tx.onerror = () => reject(tx.error);
      });
      db.close();
    },
    { name: `lamplight-journal-${userId}`, books },
  );
}

async function exportOnce(page: Page): Promise<{ measure: StepMeasure; bytes: number }> {
  let path = '';
  const measure = await measureStep(page, async () => {
    const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'Export everything' }).click()]);
    path = (await download.path())!;
  });
  return { measure, bytes: (await readFile(path)).byteLength };
}

async function main(): Promise<void> {
  const server = await startTestServer({ withApp: true });
  const browser = await launchBrowser();
  const results: { count: number; measure: StepMeasure; bytes: number }[] = [];
  try {
    for (const count of SIZES) {
      const reader = await registerThroughApi(server.baseUrl, `Bench Reader ${count}`);
      const context = await browser.newContext({ acceptDownloads: true });
      const page = await context.newPage();
      await signInThroughUi(page, server.baseUrl, reader.user.email, reader.password);
      await seedJournal(
        page,
        reader.user.id,
        Array.from({ length: count }, (_, n) => inventedBook(n)),
      );
      await page.goto(`${server.baseUrl}/settings/your-data`);
      await page.getByRole('button', { name: 'Export everything' }).waitFor();
      await watchLongTasks(page);
      await exportOnce(page); // warm-up: code and caches
      results.push({ count, ...(await exportOnce(page)) });
      await context.close();
    }
  } finally {
    await browser.close();
    await server.close();
  }
  console.log('bench-export: Export everything in Chromium (books + a reading and a session each; after one warm-up)');
  for (const { count, measure, bytes } of results) printStep(`${count.toLocaleString('en')} books, ${(bytes / 1024 / 1024).toFixed(1)} MB`, measure);
  console.log(`  ratio of times ${(results[1]!.measure.ms / results[0]!.measure.ms).toFixed(1)} for ${SIZES[1]! / SIZES[0]!}× the books`);
}

main().then(
  () => process.exit(0),
  (err: unknown) => {
    console.error(err);
    process.exit(1);
  },
);
