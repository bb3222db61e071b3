import type { BrowserContext, Page } from 'playwright-core';

import { SyncClient } from '../support/sync-client';
import { useServerAndBrowser } from './support/harness';
import { bookFacts, fillBook, syncNow } from './support/library';
import { registerThroughApi, signInThroughUi } from './support/reader';
import { waitForOfflineReady } from './support/service-worker';

const DAY = 24 * 60 * 60 * 1000;

describe('Tags from two devices, and a device whose date is wrong', () => {
  const harness = useServerAndBrowser();
  const contexts: BrowserContext[] = [];
  afterEach(async () => {
    for (const context of contexts.splice(0)) await context.close();
  });

  async function device(email: string, password: string, skewMs = 0): Promise<Page> {
    const context = await harness.browser.newContext();
    contexts.push(context);
    // Playwright's clock: the page's Date and timers start `skewMs` off and then run on.
    if (skewMs) await context.clock.install({ time: Date.now() + skewMs });
    const page = await context.newPage();
    await signInThroughUi(page, harness.server.baseUrl, email, password);
    await waitForOfflineReady(page, harness.server.baseUrl);
    return page;
  }

  async function addTag(page: Page, bookUrl: string, tags: string): Promise<void> {
    await page.goto(`${bookUrl}/edit`);
    await page.getByLabel('Tags', { exact: true }).fill(tags);
    await fillBook(page, {});
  }

  it('keeps both tags when two devices each add a different one offline', async () => {
    const reader = await registerThroughApi(harness.server.baseUrl, 'Odile Farrant');
    const tablet = await device(reader.user.email, reader.password);
    const laptop = await device(reader.user.email, reader.password);
    await tablet.goto(`${harness.server.baseUrl}/library/new`);
    await tablet.getByLabel('Tags', { exact: true }).fill('signed');
    await fillBook(tablet, { title: 'Moss on the North Wall', authors: 'Pim Arkwright', format: 'print', status: 'tbr' });
    const bookUrl = tablet.url();
    await syncNow(tablet);
    await laptop.goto(`${harness.server.baseUrl}/library`);
    await syncNow(laptop);

    await tablet.context().setOffline(true);
    await laptop.context().setOffline(true);
    await addTag(tablet, bookUrl, 'signed, reread');
    await addTag(laptop, bookUrl, 'signed, book club');
    await tablet.context().setOffline(false);
    await laptop.context().setOffline(false);
    await syncNow(tablet);
    await syncNow(laptop);
    await syncNow(tablet);

    for (const page of [tablet, laptop]) {
      await page.goto(bookUrl);
      expect((await bookFacts(page))['Tags']!.split(', ').sort()).toEqual(['book club', 'reread', 'signed']);
    }
  });

  it('syncs the writes of a browser whose clock is 3 days ahead, and says once that its date looks wrong', async () => {
    const reader = await registerThroughApi(harness.server.baseUrl, 'Tamsin Vole');
    const ahead = await device(reader.user.email, reader.password, 3 * DAY);
    await ahead.goto(`${harness.server.baseUrl}/library/new`);
    await fillBook(ahead, { title: 'A Calendar of Small Weathers', authors: 'Ede Morrow', format: 'ebook', status: 'reading' });

    // The sync after the write learns the server's time and says so once, in the sync menu.
    await ahead.getByRole('button', { name: /^Sync status/ }).click();
    await ahead
      .getByRole('alert')
      .filter({ hasText: /date looks about 3 days ahead/ })
      .waitFor({ timeout: 20_000 });
    expect(await ahead.locator('.sync-details .refused').count()).toBe(0);
    await ahead.keyboard.press('Escape');
    await syncNow(ahead);
    const pulled = await new SyncClient(harness.server.baseUrl, reader.accessToken).pullAll();

    const titles = [...pulled.state.entries()].filter(([key]) => key.endsWith('/title')).map(([, stamped]) => stamped.value);
    expect(titles).toContain('A Calendar of Small Weathers');
    await ahead.getByRole('button', { name: /^Sync status/ }).click();
    await ahead.getByText('Everything you write is saved on this device first.').waitFor();
    expect(
      await ahead
        .getByRole('alert')
        .filter({ hasText: /date looks/ })
        .count(),
    )
      .withContext('said once')
      .toBe(0);
    expect(await ahead.locator('.sync-details .refused').count()).toBe(0);
  });
});
