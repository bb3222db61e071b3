import { seriousViolations } from './support/axe';
import { useServerAndBrowser } from './support/harness';
import { fillBook, syncNow } from './support/library';
import { registerThroughApi, signInThroughUi } from './support/reader';
import { waitForOfflineReady } from './support/service-worker';

describe('Quotes', () => {
  const harness = useServerAndBrowser();

  it('are captured offline from a book page and from Add, kept through a reload, found, and copied with their source; no serious accessibility problems', async () => {
    const base = harness.server.baseUrl;
    const reader = await registerThroughApi(base, 'Perpetua Lindqvist');
    const context = await harness.browser.newContext();
    await context.grantPermissions(['clipboard-read', 'clipboard-write'], { origin: base });
    const page = await context.newPage();
    await signInThroughUi(page, base, reader.user.email, reader.password);
    await waitForOfflineReady(page, base);
    await context.setOffline(true);

    // Two books, added offline through the Add action and the library.
    await page.getByRole('button', { name: 'Add', exact: true }).click();
    await page.getByRole('menuitem', { name: 'Add a book' }).click();
    await fillBook(page, { title: 'The Fen Hours', authors: 'Ines Roa', format: 'audiobook', status: 'finished' });
    await page.getByRole('button', { name: 'Add', exact: true }).click();
    await page.getByRole('menuitem', { name: 'Add a book' }).click();
    await fillBook(page, { title: 'The Salt Road Almanac', authors: 'Ada Pell', status: 'reading', pageCount: '320' });

    // From the book page: the passage has focus; a page and a label; Enter in the page saves.
    await page.getByRole('button', { name: 'Capture a quote' }).click();
    const dialog = page.getByRole('dialog', { name: 'Capture a quote' });
    await dialog.waitFor();
    await page.waitForFunction(() => document.activeElement?.tagName === 'TEXTAREA');
    expect(await dialog.getByLabel('Book').inputValue()).toBe(new URL(page.url()).pathname.split('/').at(-1)!);
    await page.keyboard.type('Salt keeps what the sea forgets.');
    await dialog.getByRole('option', { name: /Re-read/ }).click();
    expect(await seriousViolations(page)).toEqual([]);
    await dialog.getByLabel('Page', { exact: true }).fill('42');
    await dialog.getByLabel('Page', { exact: true }).press('Enter');
    await dialog.waitFor({ state: 'detached' });
    const onBookPage = page.locator('ll-book-quotes ll-quote-card');
    await onBookPage.first().waitFor();
    expect(await onBookPage.count()).toBe(1);
    expect(await onBookPage.first().textContent()).toContain('p. 42');
    expect(await onBookPage.first().textContent()).toContain('Re-read');

    // From the Add action, for the other book, at a time in the recording; Ctrl+Enter saves.
    await page.getByRole('button', { name: 'Add', exact: true }).click();
    await page.getByRole('menuitem', { name: 'Capture a quote' }).click();
    await dialog.waitFor();
    // The dialog puts focus in the passage once it has opened; typing elsewhere before that
    // (on a slow machine) would see focus moved mid-word.
    await page.waitForFunction(() => document.activeElement?.tagName === 'TEXTAREA');
    await dialog.getByLabel('The passage').fill('Reeds keep the time, and the time keeps nothing.');
    await dialog.getByLabel('Book').selectOption({ label: 'The Fen Hours — Ines Roa' });
    await dialog.getByLabel('Audio position').fill('1:02:30');
    await dialog.getByLabel('Chapter').fill('Low Water');
    await dialog.getByLabel('The passage').press('Control+Enter');
    await dialog.waitFor({ state: 'detached' });

    // Still offline, after a reload: both quotes, newest first, with their books.
    await page.reload();
    await page.goto(`${base}/journal/quotes`);
    const cards = page.locator('ll-quote-card');
    await page.getByText('2 quotes', { exact: true }).waitFor();
    expect(await cards.nth(0).locator('blockquote').textContent()).toBe('Reeds keep the time, and the time keeps nothing.');
    expect(await cards.nth(0).locator('.source').textContent()).toContain('1:02:30');
    expect(await cards.nth(1).locator('.source').textContent()).toContain('The Salt Road Almanac');
    expect(await seriousViolations(page)).toEqual([]);

    // Search folds case; one of two is found.
    await page.getByLabel('Search quotes').fill('SEA forgets');
    await page.getByText('1 of 2 quotes').waitFor();
    expect(await cards.count()).toBe(1);

    // Copy puts the passage and its source line on the clipboard.
    await cards.first().getByRole('button', { name: 'Copy' }).click();
    await page.getByText('Copied, with its source line.').waitFor();
    expect(await page.evaluate(() => navigator.clipboard.readText())).toBe('“Salt keeps what the sea forgets.”\n— Ada Pell, The Salt Road Almanac, p. 42');

    // Back online, the quotes sync like everything else.
    await context.setOffline(false);
    await syncNow(page);
    await context.close();
  });
});
