import type { BrowserContext, Page } from 'playwright-core';

import { SyncClient } from '../support/sync-client';
import { testDataSource } from '../support/test-database';
import { useServerAndBrowser } from './support/harness';
import { syncNow } from './support/library';
import { registerThroughApi, signInThroughUi } from './support/reader';
import { waitForOfflineReady } from './support/service-worker';
import { textWhen } from './support/settled';

describe('A notebook page edited on two devices, one offline', () => {
  const harness = useServerAndBrowser();
  const contexts: BrowserContext[] = [];
  afterAll(async () => {
    for (const context of contexts) await context.close();
  });

  async function device(email: string, password: string): Promise<Page> {
    const context = await harness.browser.newContext();
    contexts.push(context);
    const page = await context.newPage();
    await signInThroughUi(page, harness.server.baseUrl, email, password);
    await waitForOfflineReady(page, harness.server.baseUrl);
    return page;
  }

  async function savePage(page: Page): Promise<void> {
    await page.getByRole('button', { name: 'Save page', exact: true }).click();
    await page.getByRole('status').filter({ hasText: 'Saved on this device.' }).waitFor();
  }

  it('keeps both devices’ words in the page on both, the open editor shows the other device’s words without a reload, and a restored version syncs', async () => {
    const { baseUrl } = harness.server;
    const reader = await registerThroughApi(baseUrl, 'Maren Quillfeather');
    const tablet = await device(reader.user.email, reader.password);
    const laptop = await device(reader.user.email, reader.password);

    // The tablet starts a page and syncs it; the laptop opens the same page.
    await tablet.goto(`${baseUrl}/journal/notebooks`);
    await tablet.getByLabel('Title', { exact: true }).fill('Shore walks');
    await tablet.getByRole('button', { name: 'Start notebook' }).click();
    await tablet.getByRole('heading', { level: 1, name: 'Shore walks' }).waitFor();
    await tablet.getByRole('button', { name: 'Add a page' }).click();
    await tablet.waitForURL(/\/journal\/notebooks\/[^/]+\/pages\/[^/]+$/);
    const pageUrl = tablet.url();
    const tabletText = tablet.getByLabel('Page text');
    await tabletText.fill('The heron waited at the edge of the water.');
    await savePage(tablet);
    await syncNow(tablet);

    await laptop.goto(`${baseUrl}/journal/notebooks`);
    await syncNow(laptop);
    await laptop.goto(pageUrl);
    const laptopText = laptop.getByLabel('Page text');
    await laptopText.waitFor();
    expect(await laptopText.inputValue()).toBe('The heron waited at the edge of the water.');

    // Offline, the tablet adds a line at the end.
    await tablet.context().setOffline(true);
    await tabletText.press('Control+End');
    await tabletText.pressSequentially('\nThe tide turned at six.');
    await savePage(tablet);
    await tablet.getByRole('button', { name: /^Sync status: Offline/ }).waitFor();

    // Meanwhile the laptop, online, changes a word at the start and syncs.
    await laptopText.press('Control+Home');
    for (let n = 0; n < 'The heron'.length; n++) await laptopText.press('Shift+ArrowRight');
    await laptopText.pressSequentially('The grey heron');
    await savePage(laptop);
    await syncNow(laptop);

    // The tablet comes back; then the laptop syncs again with its editor still open.
    await tablet.context().setOffline(false);
    await syncNow(tablet);
    await syncNow(laptop);

    const both = 'The grey heron waited at the edge of the water.\nThe tide turned at six.';
    // Without a reload, both open editors show the merged page.
    await laptop.waitForFunction((expected) => (document.querySelector('textarea') as HTMLTextAreaElement | null)?.value === expected, both);
    await tablet.waitForFunction((expected) => (document.querySelector('textarea') as HTMLTextAreaElement | null)?.value === expected, both);
    // And after a reload, from each device's own storage.
    await tablet.reload();
    await laptop.reload();
    await tabletText.waitFor();
    await laptopText.waitFor();
    expect(await tabletText.inputValue()).toBe(both);
    expect(await laptopText.inputValue()).toBe(both);

    // The server's text is the same, character for character.
    const { state } = await new SyncClient(baseUrl, reader.accessToken).pullAll();
    const pageId = new URL(pageUrl).pathname.split('/').pop()!;
    expect(state.get(`notebookPages/${pageId}/body`)?.value).toBe(both);

    // History: a version from two hours ago (put there as the server would have kept it) is
    // restored on the laptop; the restore is an edit like any other and reaches the tablet.
    const dataSource = await testDataSource();
    await dataSource.query(
      `INSERT INTO text_versions (user_id, collection, row_id, field, period, saved_at, text)
       VALUES ($1, 'notebookPages', $2, 'body', now() - interval '2 hours', now() - interval '2 hours', 'An older page about herons.')`,
      [reader.user.id, pageId],
    );
    await laptop.getByRole('button', { name: 'Page history' }).click();
    await laptop.getByRole('button', { name: /· 27 characters$/ }).click();
    const older = 'An older page about herons.';
    expect(await textWhen(laptop.getByLabel('The chosen version'), (text) => text === older)).toBe(older);
    await laptop.getByRole('button', { name: 'Restore this version' }).click();
    await laptop.getByRole('status').filter({ hasText: 'Saved on this device.' }).waitFor();
    expect(await laptopText.inputValue()).toBe('An older page about herons.');
    await syncNow(laptop);
    await syncNow(tablet);
    await tablet.waitForFunction(() => (document.querySelector('textarea') as HTMLTextAreaElement | null)?.value === 'An older page about herons.');
  });
});
