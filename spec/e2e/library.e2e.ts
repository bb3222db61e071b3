import { seriousViolations } from './support/axe';
import { useServerAndBrowser } from './support/harness';
import { bookFacts, fillBook } from './support/library';
import { registerThroughApi, signInThroughUi } from './support/reader';

describe('The library', () => {
  const harness = useServerAndBrowser();

  it('helps a new reader add a first book, then finds, sorts and re-statuses books; no serious accessibility problems', async () => {
    const reader = await registerThroughApi(harness.server.baseUrl, 'Saoirse Lindahl');
    const context = await harness.browser.newContext();
    const page = await context.newPage();
    await signInThroughUi(page, harness.server.baseUrl, reader.user.email, reader.password);

    await page.goto(`${harness.server.baseUrl}/library`);
    await page.getByRole('heading', { name: 'Your shelves are waiting' }).waitFor();
    expect(await seriousViolations(page)).toEqual([]);

    await page.getByRole('link', { name: 'Add your first book' }).click();
    expect(await seriousViolations(page)).toEqual([]);
    await fillBook(page, { title: 'The Orchard Under Snow', authors: 'Halvard Nyström', format: 'audiobook', status: 'reading' });
    await page.goto(`${harness.server.baseUrl}/library/new`);
    await fillBook(page, { title: 'A Grammar of Rivers', authors: 'Odile Marchetti', isbn: '0-8436-1072-7', pageCount: '288' });
    await page.goto(`${harness.server.baseUrl}/library/new`);
    await fillBook(page, { title: 'Moths of the Lower Fen', authors: 'Bartholomew Quist', status: 'finished', rating: '4.5' });

    await page.goto(`${harness.server.baseUrl}/library`);
    const rows = page.locator('table[aria-label="Books"] tr.mat-mdc-row');
    await rows.first().waitFor();
    expect(await rows.count()).toBe(3);
    expect(await seriousViolations(page)).toEqual([]);

    // Search by author, and by ISBN typed as its ISBN-10 (stored as ISBN-13).
    await page.getByLabel('Search the library').fill('marchetti');
    await page.getByText('1 of 3 books').waitFor();
    await page.getByLabel('Search the library').fill('9780843610727');
    await page.getByText('1 of 3 books').waitFor();
    await page.getByLabel('Search the library').fill('');

    // Sort by rating: the rated book first.
    await page.getByRole('button', { name: 'Rating' }).click();
    await page.getByRole('button', { name: 'Rating' }).click();
    expect(await rows.first().locator('a.title').textContent()).toBe('Moths of the Lower Fen');

    // Quick status change from the table, kept in the book's history.
    await page.getByLabel('Status of A Grammar of Rivers').selectOption('reading');
    await page.getByRole('link', { name: 'A Grammar of Rivers' }).click();
    expect((await bookFacts(page))['Status']).toBe('Reading');
    await page.getByRole('heading', { name: 'Status history' }).waitFor();
    expect(await page.locator('ol.history li').count()).toBe(2); // TBR when added, then Reading
    expect(await seriousViolations(page)).toEqual([]);

    // The covers view shows the same books.
    await page.goto(`${harness.server.baseUrl}/library`);
    await page
      .getByRole('radio', { name: 'As covers' })
      .click()
      .catch(() => page.getByLabel('As covers').click());
    await page.locator('ul.covers li').first().waitFor();
    expect(await page.locator('ul.covers li').count()).toBe(3);
    await context.close();
  });

  it('keeps re-reads as separate readings, each with its own dates and rating', async () => {
    const reader = await registerThroughApi(harness.server.baseUrl, 'Tadeusz Brennan');
    const context = await harness.browser.newContext();
    const page = await context.newPage();
    await signInThroughUi(page, harness.server.baseUrl, reader.user.email, reader.password);
    await page.goto(`${harness.server.baseUrl}/library/new`);
    await fillBook(page, { title: 'Salt and Lantern', authors: 'Ines Roa', status: 'finished' });

    await page.getByRole('link', { name: 'Add a reading' }).click();
    await page.getByLabel('Started on').fill('2025-02-01');
    await page.getByLabel('Finished on').fill('2025-02-20');
    await page.getByLabel('Rating', { exact: true }).selectOption('3');
    await page.getByLabel('In one line').fill('Quiet, then suddenly not.');
    await page.getByRole('button', { name: 'Save reading' }).click();
    await page.locator('article.reading').first().waitFor();

    await page.getByRole('link', { name: 'Add a re-read' }).click();
    await page.getByLabel('Started on').fill('2026-03-01');
    await page.getByLabel('Finished on').fill('2026-03-09');
    await page.getByLabel('Rating', { exact: true }).selectOption('4.5');
    await page.getByLabel('Would you recommend it?').selectOption('yes');
    await page.getByLabel('To whom?').fill('anyone who misses the sea');
    await page.getByRole('button', { name: 'Save reading' }).click();
    await page.locator('article.reading').nth(1).waitFor();

    expect(await page.locator('article.reading').count()).toBe(2);
    expect(await page.locator('article.reading').first().textContent()).toContain('anyone who misses the sea');
    expect((await bookFacts(page))['Rating']).toBe('4.5 of 5 stars'); // the book follows its latest reading

    // A finish before the start is refused with a reason, and nothing is saved.
    await page.getByRole('link', { name: 'Add a re-read' }).click();
    await page.getByLabel('Started on').fill('2026-04-10');
    await page.getByLabel('Finished on').fill('2026-04-01');
    await page.getByRole('button', { name: 'Save reading' }).click();
    await page.getByRole('alert').filter({ hasText: 'It finished before it started' }).waitFor();
    await context.close();
  });
});
