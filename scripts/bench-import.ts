/**
 * `npm run bench:import`: a generated 10,000-row spreadsheet (invented titles and authors, an
 * ISBN-10 on every third row, one row in a hundred refused for a rating out of range) through
 * Settings › Your data in Debian's Chromium against the production build: time to the preview,
 * to the dry run and to the end of the import, the page's peak JavaScript heap and main-thread
 * long tasks over 200 ms for each (goal: none).
 */
import { mkdtemp, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

import { isbn10CheckDigit } from '../shared/isbn/isbn10-check-digit';
import { launchBrowser } from '../spec/e2e/support/browser';
import { registerThroughApi, signInThroughUi } from '../spec/e2e/support/reader';
import { startTestServer } from '../spec/support/test-server';
import { inventedBook, measureStep, printStep, watchLongTasks } from './bench-in-page';

/** `LAMPLIGHT_BENCH_ROWS` makes a smaller spreadsheet, for profiling (a multiple of 100). */
const ROWS = Number(process.env['LAMPLIGHT_BENCH_ROWS'] ?? 10_000);

function spreadsheet(): string {
  const lines = ['Title,Author,ISBN,Status,Rating,Date finished,Tags'];
  for (let n = 0; n < ROWS; n++) {
    const { title, author } = inventedBook(n);
    const body = String(100_000_000 + n).slice(-9);
    const isbn = n % 3 === 0 ? `${body}${isbn10CheckDigit(body)}` : '';
    const rating = n % 100 === 99 ? '9' : String((n % 5) + 1);
    lines.push(`"${title}",${author},${isbn},${n % 2 ? 'read' : 'to read'},${rating},2025-0${(n % 9) + 1}-1${n % 10},"bench, generated"`);
  }
  return lines.join('\r\n');
}

async function main(): Promise<void> {
  const server = await startTestServer({ withApp: true });
  const folder = await mkdtemp(join(tmpdir(), 'bench-import-'));
  const browser = await launchBrowser();
  try {
    const reader = await registerThroughApi(server.baseUrl, 'Bench Importer');
    const context = await browser.newContext();
    const page = await context.newPage();
    await signInThroughUi(page, server.baseUrl, reader.user.email, reader.password);
    await page.goto(`${server.baseUrl}/settings/your-data`);
    await page.getByLabel('Choose a file to import').waitFor();
    await watchLongTasks(page);
    const csv = Buffer.from(spreadsheet());
    // From a file on disk, as a reader's file picker gives it: a buffer is rebuilt by script in the page, itself a long task.
    const csvPath = join(folder, 'generated.csv');
    await writeFile(csvPath, csv);
    const preview = await measureStep(page, async () => {
      await page.getByLabel('Choose a file to import').setInputFiles(csvPath);
      await page.getByText(`(${ROWS.toLocaleString('en').replace(',', '')} in all)`).waitFor({ timeout: 120_000 });
    });
    const dryRun = await measureStep(page, async () => {
      await page.getByRole('button', { name: 'Check the rows' }).click();
      await page.getByRole('list', { name: 'Refused rows' }).waitFor({ timeout: 120_000 });
    });
    const expected = ROWS - ROWS / 100;
    const imported = await measureStep(page, async () => {
      await page.getByRole('button', { name: `Import ${expected} books` }).click();
      // Progress every 30 s: a batch that grows slower with the outbox (quadratic) shows here.
      const started = Date.now();
      const ticker = setInterval(() => {
        void page
          .getByText(/^\d+ of \d+ books$/)
          .textContent({ timeout: 1_000 })
          .then((text) => console.log(`  … ${text} after ${((Date.now() - started) / 1000).toFixed(0)} s`))
          .catch(() => undefined);
      }, 30_000);
      try {
        await page.getByText(`Imported ${expected} books.`).waitFor({ timeout: 600_000 });
      } finally {
        clearInterval(ticker);
      }
    });
    console.log(`bench-import: a ${ROWS.toLocaleString('en')}-row CSV (${(csv.byteLength / 1024 / 1024).toFixed(1)} MB) in Chromium`);
    printStep('preview (parse)', preview);
    printStep('dry run', dryRun);
    printStep('import', imported);
    console.log(
      `  ${((expected / imported.ms) * 1000).toFixed(0)} books a second, ${expected} books in batches of 50 (CSV_ROWS_PER_BATCH; one IndexedDB transaction each)`,
    );
    await context.close();
  } finally {
    await browser.close();
    await server.close();
    await rm(folder, { recursive: true, force: true });
  }
}

main().then(
  () => process.exit(0),
  (err: unknown) => {
    console.error(err);
    process.exit(1);
  },
);
