import { seriousViolations } from './support/axe';
import { useServerAndBrowser } from './support/harness';
import { bookFacts, fillBook } from './support/library';
import { registerThroughApi, signInThroughUi } from './support/reader';
import { waitForOfflineReady } from './support/service-worker';
import { settled, textWhen, valueWhen } from './support/settled';

describe('The journal, offline', () => {
  const harness = useServerAndBrowser();

  it('follows a series of three books with a label, keeps a quote with a page and a label and a notebook page from a template, and has it all after a reload', async () => {
    const { baseUrl } = harness.server;
    const reader = await registerThroughApi(baseUrl, 'Ottoline Varga');
    const context = await harness.browser.newContext();
    const page = await context.newPage();
    await signInThroughUi(page, baseUrl, reader.user.email, reader.password);
    await waitForOfflineReady(page, baseUrl);
    await context.setOffline(true);

    await page.goto(`${baseUrl}/journal`);
    expect(await seriousViolations(page)).toEqual([]);
    await page.getByRole('link', { name: /Series/ }).click();
    await page.getByRole('button', { name: 'New series' }).click();
    await page.getByLabel('Series name').fill('The Lanternwright Trilogy');
    await page.getByLabel('Books planned').fill('3');
    await page.getByRole('button', { name: 'Add the series' }).click();
    await page.getByRole('heading', { name: 'The Lanternwright Trilogy' }).waitFor();

    const titles = ['Wick and Ember', 'The Glass Chimney', 'Last Light over Harrow'];
    for (const [n, title] of titles.entries()) {
      await page.goto(`${baseUrl}/library/new`);
      await page.getByLabel('Series', { exact: true }).selectOption({ label: 'The Lanternwright Trilogy' });
      await page.getByLabel('Place in the series').fill(String(n + 1));
      if (n === 0) await page.getByRole('option', { name: 'Buddy read' }).click();
      await fillBook(page, { title, authors: 'Perpetua Lowe', status: n === 0 ? 'reading' : 'tbr' });
    }

    // Finishing book 1 from the library suggests book 2.
    await page.goto(`${baseUrl}/library`);
    await page.getByLabel('Status of Wick and Ember').selectOption('finished');
    await page.getByText('Next in The Lanternwright Trilogy: The Glass Chimney').waitFor();

    // A quote with a page and a label, captured from the book's page.
    await page.getByRole('link', { name: 'Wick and Ember' }).click();
    await page.getByRole('button', { name: 'Capture a quote' }).click();
    const dialog = page.getByRole('dialog', { name: 'Capture a quote' });
    await dialog.getByLabel('The passage').fill('A wick remembers every flame it has carried.');
    await dialog.getByRole('option', { name: /Comfort read/ }).click();
    await dialog.getByLabel('Page', { exact: true }).fill('17');
    await dialog.getByLabel('Page', { exact: true }).press('Enter');
    await dialog.waitFor({ state: 'detached' });

    // A notebook page started from one of the templates that come with the app.
    await page.goto(`${baseUrl}/journal/notebooks`);
    await page.getByLabel('Title', { exact: true }).fill('Lanternwright notes');
    await page.getByRole('button', { name: 'Start notebook' }).click();
    await page.getByRole('heading', { level: 1, name: 'Lanternwright notes' }).waitFor();
    await page.getByLabel('Start from').selectOption({ label: 'After a sitting' });
    await page.getByRole('button', { name: 'Add a page' }).click();
    await page.getByLabel('Page title').waitFor();
    expect(await valueWhen(page.getByLabel('Page text'), (text) => text.includes('## Where I stopped'))).toContain('## Where I stopped');
    await page.getByRole('button', { name: 'Save page', exact: true }).click();
    await page.getByRole('status').filter({ hasText: 'Saved on this device.' }).waitFor();

    // After a reload, still offline, everything is there.
    await page.reload();
    await page.goto(`${baseUrl}/journal/quotes`);
    const quote = page.locator('ll-quote-card').first();
    await quote.waitFor();
    expect(await quote.textContent()).toContain('p. 17');
    expect(await quote.textContent()).toContain('Comfort read');
    await page.goto(`${baseUrl}/journal/notebooks`);
    await page.getByRole('link', { name: /Lanternwright notes/ }).click();
    // The notebook opens with its page, from this device.
    await page.getByText('Where I stopped').first().waitFor();
    await page.goto(`${baseUrl}/journal/series`);
    await page.getByText('1 of 3 read').waitFor();
    expect(await page.getByRole('link', { name: 'The Glass Chimney' }).count()).toBe(1);
    expect(await seriousViolations(page)).toEqual([]);

    await page.getByRole('link', { name: 'The Lanternwright Trilogy' }).click();
    await page.locator('ol.books li a').nth(2).waitFor();
    const order = await page.locator('ol.books li a').allTextContents();
    expect(order).toEqual(titles);
    expect(await seriousViolations(page)).toEqual([]);

    // The label shows on the book and filters the library.
    await page.getByRole('link', { name: 'Wick and Ember' }).click();
    const facts = await settled(
      () => bookFacts(page),
      (shown) => shown['Series']?.includes('The Lanternwright Trilogy') ?? false,
    );
    expect(facts['Series']).toContain('The Lanternwright Trilogy');
    expect(await textWhen(page.locator('ll-label-chips').first(), (text) => text.includes('Buddy read'))).toContain('Buddy read');
    await page.goto(`${baseUrl}/library`);
    await page.getByLabel('Label', { exact: true }).selectOption({ label: 'Buddy read' });
    await page.getByText('1 of 3 books').waitFor();

    // Favourites and picks, and labels of one's own.
    await page.goto(`${baseUrl}/journal/favourites`);
    await page
      .getByRole('combobox', { name: /^Pick of [A-Z][a-z]+ \d{4}$/ })
      .first()
      .selectOption({ label: 'Wick and Ember' });
    expect(await seriousViolations(page)).toEqual([]);
    await page.goto(`${baseUrl}/journal/labels`);
    await page.getByRole('button', { name: 'New label' }).click();
    await page.getByLabel('Label name').fill('Read aloud');
    await page.getByRole('button', { name: 'Save label' }).click();
    await page.getByText('Read aloud').waitFor();
    expect(await seriousViolations(page)).toEqual([]);

    await page.reload();
    await page.goto(`${baseUrl}/journal/favourites`);
    const pick = page.getByRole('combobox', { name: /^Pick of [A-Z][a-z]+ \d{4}$/ }).first();
    expect(await pick.evaluate((select: HTMLSelectElement) => select.selectedOptions[0]?.textContent)).toBe('Wick and Ember');
    await context.close();
  });
});
