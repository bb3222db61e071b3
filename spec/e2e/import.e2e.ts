import { readFile } from 'node:fs/promises';

import type { Page } from 'playwright-core';

import { seriousViolations } from './support/axe';
import { useServerAndBrowser } from './support/harness';
import { registerThroughApi, signInThroughUi } from './support/reader';

/** An invented reader's spreadsheet: their own headers, a date layout of theirs, one status we do not know, one bad ISBN. */
const SPREADSHEET = [
  'Book Title,Author,ISBN,Status,Stars,Date finished,Shelves',
  'Harbour of Small Lights,Odile Ferrant,0-306-40615-2,Read,4,12/03/2025,"sea, winter"',
  'A Kettle for Winter,Bram Ostrander,,Shelved,,,',
  'The Glass Orchard,Pia Lund,978-0-306-40615-8,Read,5,01/04/2025,',
].join('\r\n');

const pageWidth = (page: Page) => page.evaluate(() => ({ scrollWidth: document.documentElement.scrollWidth, windowWidth: window.innerWidth }));

describe('Your data', () => {
  const harness = useServerAndBrowser();

  it('imports a CSV with a column and value mapping, refusing a row with a bad ISBN, then exports everything; fits a phone and has no serious accessibility problems', async () => {
    const base = harness.server.baseUrl;
    const reader = await registerThroughApi(base, 'Linnea Okafor');
    const context = await harness.browser.newContext({ viewport: { width: 390, height: 844 }, acceptDownloads: true });
    const page = await context.newPage();
    await signInThroughUi(page, base, reader.user.email, reader.password);

    await page.goto(`${base}/settings`);
    await page.getByRole('link', { name: 'Your data' }).click();
    await page.getByRole('heading', { name: 'Your data', level: 1 }).waitFor();
    await page.getByLabel('Choose a file to import').setInputFiles({ name: 'my-books.csv', mimeType: 'text/csv', buffer: Buffer.from(SPREADSHEET) });

    // The preview and the guesses from the headers.
    await page.getByText('First rows of my-books.csv (3 in all)').waitFor();
    expect(await page.getByLabel('Book Title').inputValue()).toBe('title');
    expect(await page.getByLabel('Stars').inputValue()).toBe('rating');
    expect(await page.getByLabel('Shelves').inputValue()).toBe('shelves');
    await page.getByLabel('Dates are written as').selectOption('dd/MM/yyyy');

    // "Shelved" is not a status we know: first refused, then mapped by the reader.
    await page.getByRole('button', { name: 'Check the rows' }).click();
    const refused = page.getByRole('list', { name: 'Refused rows' });
    await refused.waitFor();
    expect(await refused.textContent()).toContain('Row 2: status "Shelved" is not one we know');
    expect(await refused.textContent()).toContain('Row 3: ISBN "978-0-306-40615-8" has a wrong check digit');
    await page.getByLabel('“Shelved”').selectOption('tbr');
    await page.getByRole('button', { name: 'Check the rows' }).click();
    await page.getByText('2 books would be added; 0 are already in your library (left out); 1 rows would be refused.').waitFor();
    expect((await page.getByRole('list', { name: 'Refused rows' }).locator('li').allTextContents()).map((text) => text.trim())).toEqual([
      'Row 3: ISBN "978-0-306-40615-8" has a wrong check digit',
    ]);
    const { scrollWidth, windowWidth } = await pageWidth(page);
    expect(scrollWidth).withContext('no sideways scrolling at 390 px').toBeLessThanOrEqual(windowWidth);
    expect(await seriousViolations(page)).toEqual([]);

    await page.getByRole('button', { name: 'Import 2 books' }).click();
    await page.getByText('Imported 2 books.').waitFor();

    // Export everything: the file holds the imported books (ISBN-10 turned into ISBN-13).
    const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'Export everything' }).click()]);
    expect(download.suggestedFilename()).toMatch(/^lamplight-export-\d{4}-\d{2}-\d{2}\.json$/);
    const file = JSON.parse(await readFile((await download.path())!, 'utf8')) as { format: string; collections: { books: { fields: Record<string, unknown> }[] } };
    expect(file.format).toBe('lamplight-export');
    const harbour = file.collections.books.find((book) => book.fields['title'] === 'Harbour of Small Lights');
    expect(harbour?.fields).toEqual(jasmine.objectContaining({ isbn: '9780306406157', status: 'finished', rating: 4, tags: ['sea', 'winter'] }));

    await page.goto(`${base}/library`);
    await page.getByText('A Kettle for Winter').first().waitFor();
    await context.close();
  }, 300_000);
});
