import type { Browser, BrowserContext, Page } from 'playwright-core';

import { HARD_CASES, inventedIsbn13 } from '../../sync-server/src/local-catalogue/invented-records';
import { startLocalCatalogue, type RunningCatalogue } from '../../sync-server/src/local-catalogue/sru-server';
import { startTestServer, type RunningServer } from '../support/test-server';
import { seriousViolations } from './support/axe';
import { launchBrowser } from './support/browser';
import { bookFacts } from './support/library';
import { registerThroughApi, signInThroughUi } from './support/reader';
import { waitForOfflineReady } from './support/service-worker';

/** Each step is a few page loads; on a loaded two-core machine that can pass a minute. */
const STEP_MS = 150_000;

/** The fill-in dialog's tick box for a field, by its label ("Title: …"). */
const tickBox = (page: Page, label: string) => page.getByRole('dialog').getByRole('checkbox', { name: new RegExp(`^${label}:`) });

describe('Filling in a book from the catalogue', () => {
  let catalogue: RunningCatalogue;
  let server: RunningServer;
  let browser: Browser;

  let context: BrowserContext;
  let page: Page;

  // One reader, signed in once (slow on a busy machine), through every step in order.
  beforeAll(async () => {
    catalogue = await startLocalCatalogue(0);
    server = await startTestServer({ withApp: true, env: { LAMPLIGHT_CATALOGUE_URLS: catalogue.url } });
    browser = await launchBrowser();
    const reader = await registerThroughApi(server.baseUrl, 'Rosalind Achterberg');
    context = await browser.newContext();
    page = await context.newPage();
    await signInThroughUi(page, server.baseUrl, reader.user.email, reader.password);
    await waitForOfflineReady(page, server.baseUrl);
  }, STEP_MS);
  afterAll(async () => {
    await context?.close();
    await browser?.close();
    await server?.close();
    await catalogue?.close();
  });

  it(
    'adds a book by ISBN online: the match fills the empty fields and asks before replacing the typed title',
    async () => {
      await page.goto(`${server.baseUrl}/library/new`);
      await page.getByLabel('Title', { exact: true }).fill('Orchard (borrowed copy)');
      await page.getByLabel('ISBN', { exact: true }).fill(HARD_CASES.audiobook.isbn13);
      await page.getByRole('button', { name: 'Fill in from the catalogue' }).click();
      await page.getByRole('heading', { name: 'Details from the catalogue' }).waitFor();
      expect(await seriousViolations(page)).toEqual([]);

      // The typed title is offered, unticked, with what it would replace; empty fields are ticked.
      expect(await tickBox(page, 'Title').isChecked()).toBeFalse();
      await page.getByText('Replaces what you typed: “Orchard (borrowed copy)”').waitFor();
      expect(await tickBox(page, 'Authors').isChecked()).toBeTrue();
      expect(await tickBox(page, 'Length in minutes').isChecked()).toBeTrue();
      await tickBox(page, 'Genres').uncheck();
      await page.getByRole('button', { name: 'Fill in the chosen details' }).click();
      await page.getByText('Filled in 6 details from the catalogue').waitFor(); // authors, format, minutes, publisher, year, language

      expect(await page.getByLabel('Title', { exact: true }).inputValue()).toBe('Orchard (borrowed copy)');
      expect(await page.getByLabel('Authors', { exact: true }).inputValue()).toBe('Halvard Nyström');
      expect(await page.getByLabel('Length in minutes', { exact: true }).inputValue()).toBe('555');
      expect(await page.getByLabel('Genres', { exact: true }).inputValue()).toBe('');
      await page.getByRole('button', { name: 'Save', exact: true }).click();

      const facts = await bookFacts(page);
      expect(facts['Title']).toBe('Orchard (borrowed copy)');
      expect(facts['Format']).toBe('Audiobook');
      expect(await page.locator('article.book .authors').textContent()).toContain('Halvard Nyström');
    },
    STEP_MS,
  );

  it(
    'says plainly when no catalogue has the ISBN, and saves the book as typed; search shows results with year and format',
    async () => {
      await page.goto(`${server.baseUrl}/library/new`);
      await page.getByLabel('Title', { exact: true }).fill('A book no catalogue knows');
      await page.getByLabel('ISBN', { exact: true }).fill(inventedIsbn13(8888));
      await page.getByRole('button', { name: 'Fill in from the catalogue' }).click();
      await page.getByRole('status').filter({ hasText: 'The catalogue has no book with this ISBN' }).waitFor();
      await page.getByRole('button', { name: 'Save', exact: true }).click();
      expect((await bookFacts(page))['Title']).toBe('A book no catalogue knows');

      await page.goto(`${server.baseUrl}/library/new`);
      await page.getByLabel('Title or author').fill('grammar of rivers');
      await page.getByRole('button', { name: 'Search the catalogue' }).click();
      const result = page.getByRole('list', { name: 'Catalogue results' }).getByRole('button').first();
      expect(await result.textContent()).toContain('2023 · Print · Tidewrack Press');
      await result.click();
      await page.getByRole('button', { name: 'Fill in the chosen details' }).click();
      await page.getByRole('status').filter({ hasText: 'Filled in from the catalogue' }).waitFor();
      expect(await page.getByLabel('Title', { exact: true }).inputValue()).toBe('A grammar of rivers');
      expect(await page.getByLabel('Authors', { exact: true }).inputValue()).toBe('Juniper Asquith, Odile Marchetti');
    },
    STEP_MS,
  );

  it(
    'offline, saves the book as typed and queues the look-up; back online, the book page offers the match',
    async () => {
      await page.goto(`${server.baseUrl}/library/new`);
      await context.setOffline(true);
      await page.getByLabel('Title', { exact: true }).fill('Tidal notes');
      await page.getByLabel('ISBN', { exact: true }).fill(HARD_CASES.seriesEntry.isbn13);
      await page.getByRole('button', { name: 'Fill in from the catalogue' }).click();
      await page.getByRole('status').filter({ hasText: 'You’re offline' }).waitFor();
      await page.getByRole('button', { name: 'Save', exact: true }).click();
      expect((await bookFacts(page))['Title']).toBe('Tidal notes');
      await page.getByText(`ISBN ${HARD_CASES.seriesEntry.isbn13} will be looked up`).waitFor();

      await context.setOffline(false);
      // The browser's "online" event asks again by itself; where it does not fire, "Try now" does.
      const offer = page.getByRole('heading', { name: 'We found details for this ISBN' });
      if (
        !(await offer.waitFor({ timeout: 3000 }).then(
          () => true,
          () => false,
        ))
      ) {
        await page
          .getByRole('button', { name: 'Try now' })
          .click({ timeout: 3000 })
          .catch(() => undefined);
      }
      await offer.waitFor();
      expect(await seriousViolations(page)).toEqual([]);
      await page.getByRole('button', { name: 'Review the details' }).click();
      expect(await tickBox(page, 'Title').isChecked()).toBeFalse();
      await page.getByRole('button', { name: 'Fill in the chosen details' }).click();

      await page.locator('article.book .authors', { hasText: 'Clementine Weatherby' }).waitFor();
      const facts = await bookFacts(page);
      expect(facts['Title']).toBe('Tidal notes');
      expect(facts['Length']).toContain('412');
      expect(await offer.count()).toBe(0);
    },
    STEP_MS,
  );

  it(
    'with the catalogue down, says so and still saves the book',
    async () => {
      await catalogue.close();
      await page.goto(`${server.baseUrl}/library/new`);
      await page.getByLabel('Title', { exact: true }).fill('Letters, typed by hand');
      // An ISBN no spec looks up while the catalogue is up, so no cached answer stands in.
      await page.getByLabel('ISBN', { exact: true }).fill(HARD_CASES.nonLatin.greek);
      await page.getByRole('button', { name: 'Fill in from the catalogue' }).click();
      await page.getByRole('status').filter({ hasText: 'The catalogue can’t be reached just now' }).waitFor();
      await page.getByRole('button', { name: 'Save', exact: true }).click();
      expect((await bookFacts(page))['Title']).toBe('Letters, typed by hand');
    },
    STEP_MS,
  );
});
