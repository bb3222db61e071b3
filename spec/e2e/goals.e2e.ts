import type { Page } from 'playwright-core';

import { seriousViolations } from './support/axe';
import { useServerAndBrowser } from './support/harness';
import { fillBook } from './support/library';
import { registerThroughApi, signInThroughUi } from './support/reader';
import { waitForOfflineReady } from './support/service-worker';

/** The words of an element, spaces squeezed. */
async function words(page: Page, selector: string): Promise<string> {
  return ((await page.locator(selector).first().textContent()) ?? '').replace(/\s+/g, ' ').trim();
}

/** Waits until an element's words include `text`. */
async function waitForWords(page: Page, selector: string, text: string): Promise<void> {
  await page.waitForFunction(
    ([css, wanted]) => Array.from(document.querySelectorAll(css)).some((element) => (element.textContent ?? '').replace(/\s+/g, ' ').includes(wanted)),
    [selector, text] as const,
  );
}

describe('Goals and challenges, offline', () => {
  const harness = useServerAndBrowser();

  it('sets a yearly goal, finishes two books, and sees the pace, a count and an A to Z move with the same book in both', async () => {
    const { baseUrl } = harness.server;
    const reader = await registerThroughApi(baseUrl, 'Perpetua Lowe');
    const context = await harness.browser.newContext();
    const page = await context.newPage();
    await signInThroughUi(page, baseUrl, reader.user.email, reader.password);
    await waitForOfflineReady(page, baseUrl);
    await context.setOffline(true);

    // A yearly goal of books, from the shell's new destination.
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Goals' }).click();
    const year = new Date().getFullYear();
    await page.getByRole('heading', { name: `Goals for ${year}` }).waitFor();
    expect(await seriousViolations(page)).toEqual([]);
    await page.getByLabel('Books this year').fill('24');
    await page.getByRole('button', { name: 'Save targets' }).click();
    await waitForWords(page, 'li.unit[data-unit="books"] .so-far', '0 of 24 books');
    const paceBefore = await words(page, 'li.unit[data-unit="books"] .message');
    expect(await seriousViolations(page)).toEqual([]);

    // A count challenge of any N (2), and an A to Z by title.
    await page.getByRole('link', { name: 'New challenge' }).click();
    await page.getByRole('heading', { name: 'New challenge' }).waitFor();
    expect(await page.getByRole('radio', { name: '25', exact: true }).isChecked()).toBeTrue();
    await page.getByRole('radio', { name: 'Another number' }).check();
    await page.getByLabel('Number of books', { exact: true }).fill('2');
    await page.getByLabel('Name', { exact: true }).fill('Two to start');
    expect(await seriousViolations(page)).toEqual([]);
    await page.getByRole('button', { name: 'Start the challenge' }).click();
    await page.getByRole('heading', { name: 'Two to start' }).waitFor();
    await waitForWords(page, '.line', '0 of 2 books');

    await page.goto(`${baseUrl}/goals/challenges/new`);
    await page.getByRole('radio', { name: /^A to Z/ }).check();
    await page.getByRole('radio', { name: 'By title', exact: true }).check();
    await page.getByLabel('Name', { exact: true }).fill('Alphabet of the year');
    await page.getByRole('button', { name: 'Start the challenge' }).click();
    await page.getByRole('heading', { name: 'Alphabet of the year' }).waitFor();
    await waitForWords(page, '.line', '0 of 26 letters');

    // Two books to finish, and one to read next that would fill C.
    for (const book of [
      { title: 'The Quiet Orchard', authors: 'Ada Okafor', status: 'reading' },
      { title: 'Brine and Bellflower', authors: 'Ona Marsh', status: 'reading' },
      { title: 'The Cedar Lantern', authors: 'Kit Ashdown', status: 'tbr' },
    ]) {
      await page.goto(`${baseUrl}/library/new`);
      await fillBook(page, book);
    }
    await page.goto(`${baseUrl}/library`);
    for (const title of ['The Quiet Orchard', 'Brine and Bellflower']) {
      await page.getByLabel(`Status of ${title}`).selectOption('finished');
      await page.waitForFunction((label) => document.querySelector<HTMLSelectElement>(`select[aria-label="${label}"]`)?.value === 'finished', `Status of ${title}`);
    }

    // The pace moved.
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Goals' }).click();
    await waitForWords(page, 'li.unit[data-unit="books"] .so-far', '2 of 24 books');
    expect(await words(page, 'li.unit[data-unit="books"] .message')).not.toBe(paceBefore);
    await waitForWords(page, '.challenges', 'Two to start');
    expect(await words(page, '.challenges')).toContain('2 of 2 books · finished');
    expect(await words(page, '.challenges')).toContain('2 of 26 letters');
    expect(await seriousViolations(page)).toEqual([]);

    // This month's page lists both books.
    await page.locator('.months li.now a').click();
    await page.getByRole('heading', { name: 'Finished', exact: true }).waitFor();
    const finished = 'ul.books[aria-labelledby="finished-heading"]';
    await waitForWords(page, finished, 'The Quiet Orchard');
    expect(await words(page, finished)).toContain('Brine and Bellflower');
    expect(await page.locator('ll-month-heatmap [role="img"]').getAttribute('aria-label')).toMatch(/^Reading in [A-Z][a-z]+ \d{4}: /);
    expect(await seriousViolations(page)).toEqual([]);
    await page.getByRole('link', { name: `Up to ${year}` }).waitFor();

    // The list celebrates the finished count, once.
    await page.goto(`${baseUrl}/goals/challenges`);
    await page.getByText('You finished “Two to start”.').waitFor();
    expect(await seriousViolations(page)).toEqual([]);

    // The A to Z: Q (past "The") and B filled, C suggested from the TBR.
    await page.getByRole('link', { name: 'Alphabet of the year' }).click();
    await page.getByRole('heading', { name: 'Alphabet of the year' }).waitFor();
    await waitForWords(page, '.line', '2 of 26 letters');
    expect(await words(page, '.letters li[data-letter="Q"]')).toContain('The Quiet Orchard');
    expect(await words(page, '.letters li[data-letter="B"]')).toContain('Brine and Bellflower');
    expect(await words(page, '.letters li[data-letter="C"]')).toContain('From your TBR: The Cedar Lantern');
    expect(await words(page, '.counted')).toContain('The Quiet Orchard');
    expect(await seriousViolations(page)).toEqual([]);

    // The same book counted in the count challenge too; its celebration is not shown again.
    await page.goto(`${baseUrl}/goals/challenges`);
    await page.getByRole('link', { name: 'Two to start' }).click();
    await page.getByRole('heading', { name: 'Two to start' }).waitFor();
    await waitForWords(page, '.counted', 'The Quiet Orchard');
    expect(await words(page, '.line')).toMatch(/^2 of 2 books .*Finished$/);
    expect(await page.locator('ll-challenge-celebration').count()).toBe(0);
    expect(await seriousViolations(page)).toEqual([]);

    // Still there after a reload, offline.
    await page.reload();
    await waitForWords(page, '.counted', 'Brine and Bellflower');
    await context.close();
    // Room for a loaded machine: npm test runs two e2e shards on two cores.
  }, 180_000);
});
