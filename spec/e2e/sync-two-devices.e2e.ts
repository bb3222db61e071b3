import type { BrowserContext, Page } from 'playwright-core';

import { SyncClient } from '../support/sync-client';
import { useServerAndBrowser } from './support/harness';
import { bookFacts, fillBook, syncNow } from './support/library';
import { registerThroughApi, signInThroughUi } from './support/reader';
import { waitForOfflineReady } from './support/service-worker';

describe('Two devices of one reader editing offline', () => {
  const harness = useServerAndBrowser();
  const contexts: BrowserContext[] = [];

  async function device(email: string, password: string): Promise<Page> {
    const context = await harness.browser.newContext();
    contexts.push(context);
    const page = await context.newPage();
    await signInThroughUi(page, harness.server.baseUrl, email, password);
    await waitForOfflineReady(page, harness.server.baseUrl);
    return page;
  }

  it('merges per field when both come back online, loses nothing typed offline, and matches the server', async () => {
    const reader = await registerThroughApi(harness.server.baseUrl, 'Ines Calloway');
    const tablet = await device(reader.user.email, reader.password);
    const laptop = await device(reader.user.email, reader.password);

    // Online: the tablet adds a book, the laptop receives it.
    await tablet.goto(`${harness.server.baseUrl}/library/new`);
    await fillBook(tablet, { title: 'The Cartographer of Tides', authors: 'Nell Ashby', format: 'print', status: 'reading', pageCount: '320' });
    const bookUrl = tablet.url();
    await syncNow(tablet);
    await laptop.goto(`${harness.server.baseUrl}/library`);
    await syncNow(laptop);
    await laptop.getByRole('link', { name: /The Cartographer of Tides/ }).click();
    expect((await bookFacts(laptop))['Length']).toBe('320 pages');

    // Both go offline and edit the same book: different fields, and the rating on both.
    await tablet.context().setOffline(true);
    await laptop.context().setOffline(true);
    await tablet.goto(`${bookUrl}/edit`);
    await fillBook(tablet, { title: 'The Cartographer of Quiet Tides', rating: '4' });
    await laptop.goto(`${bookUrl}/edit`);
    await fillBook(laptop, { pageCount: '352', rating: '3.5' }); // later, so its rating wins

    // Nothing typed offline is lost across a reload.
    await laptop.reload();
    expect(await bookFacts(laptop)).toEqual(jasmine.objectContaining({ Length: '352 pages', Rating: '3.5 of 5 stars' }));

    await laptop.getByRole('button', { name: /^Sync status: Offline · 2 changes waiting/ }).waitFor();

    // Back online: sync both (the tablet twice, to receive the laptop's edits).
    await tablet.context().setOffline(false);
    await laptop.context().setOffline(false);
    await syncNow(tablet);
    await syncNow(laptop);
    await syncNow(tablet);

    const expected = { Title: 'The Cartographer of Quiet Tides', Length: '352 pages', Rating: '3.5 of 5 stars', Status: 'Reading', Format: 'Print' };
    await tablet.reload();
    await laptop.reload();
    expect(await bookFacts(tablet)).toEqual(jasmine.objectContaining(expected));
    expect(await bookFacts(laptop)).toEqual(jasmine.objectContaining(expected));

    // And that is the server's state too.
    const { state } = await new SyncClient(harness.server.baseUrl, reader.accessToken).pullAll();
    const rowId = new URL(bookUrl).pathname.split('/').pop()!;
    expect(state.get(`books/${rowId}/title`)?.value).toBe('The Cartographer of Quiet Tides');
    expect(state.get(`books/${rowId}/pageCount`)?.value).toBe(352);
    expect(state.get(`books/${rowId}/rating`)?.value).toBe(3.5);
    expect(state.get(`books/${rowId}/authors`)?.value).toEqual(['Nell Ashby']);

    for (const context of contexts) await context.close();
  });
});
