import { createHash } from 'node:crypto';

import type { BrowserContext, Page } from 'playwright-core';

import { png } from '../support/images';
import { SyncClient } from '../support/sync-client';
import { useServerAndBrowser } from './support/harness';
import { fillBook, shownCover, syncNow } from './support/library';
import { registerThroughApi, signInThroughUi } from './support/reader';
import { waitForOfflineReady } from './support/service-worker';

const sha256 = (bytes: Buffer) => createHash('sha256').update(bytes).digest('hex');

/** GET /api/uploads/:id as the reader, until the upload has arrived (or the time is up). */
async function uploadedCover(baseUrl: string, token: string, id: string, timeoutMs = 20_000): Promise<{ status: number; type: string; bytes: Buffer }> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const res = await fetch(`${baseUrl}/api/uploads/${id}`, { headers: { authorization: `Bearer ${token}` } });
    if (res.status === 200 || Date.now() > deadline) {
      return { status: res.status, type: res.headers.get('content-type') ?? '', bytes: Buffer.from(await res.arrayBuffer()) };
    }
    await new Promise((resolve) => setTimeout(resolve, 250));
  }
}

describe('Book covers', () => {
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

  afterEach(async () => {
    for (const context of contexts.splice(0)) await context.close();
  });

  it('adds a book with a cover offline, reloads, sees it, comes online and sees the cover on a second browser context', async () => {
    const { baseUrl } = harness.server;
    const reader = await registerThroughApi(baseUrl, 'Oona Achterberg');
    const phone = await device(reader.user.email, reader.password);

    // Offline: add a book with a cover. The bytes are a 900 × 1350 PNG built in Node
    // (spec/support/images.ts), handed to the picker's file input as the file dialog would.
    await phone.context().setOffline(true);
    await phone.goto(`${baseUrl}/library/new`);
    await phone.getByLabel('Choose a cover image').setInputFiles({ name: 'scan.png', mimeType: 'image/png', buffer: png({ width: 900, height: 1350 }) });
    await phone.getByText('Saved on this device; uploads when you are online').waitFor();
    const preview = await shownCover(phone, 'll-cover-picker');
    expect([preview.naturalWidth, preview.naturalHeight]).toEqual([400, 600]); // at most 600 px tall, shape kept
    await fillBook(phone, { title: 'The Lantern Keeper', authors: 'Ada Rook' });
    const bookUrl = phone.url();

    // Still offline, after a reload: the cover comes from this device.
    await phone.reload();
    const offlineCover = await shownCover(phone, 'article.book');
    expect(offlineCover.src).toMatch(/^blob:/);
    expect(offlineCover.naturalWidth).toBeGreaterThan(0);

    // Online: the book syncs and the cover uploads.
    await phone.context().setOffline(false);
    await syncNow(phone);
    const rowId = new URL(bookUrl).pathname.split('/').pop()!;
    const { state } = await new SyncClient(baseUrl, reader.accessToken).pullAll();
    const coverId = state.get(`books/${rowId}/coverId`)?.value as string;
    expect(coverId).toMatch(/^[0-9a-f]{64}$/);

    // The server has the very bytes the book names: the device's SHA-256 is the server's id.
    const upload = await uploadedCover(baseUrl, reader.accessToken, coverId);
    expect(upload.status).toBe(200);
    expect(sha256(upload.bytes)).toBe(coverId);
    expect(upload.type).toMatch(/^image\/(webp|jpeg)/);

    // A second device of the same reader fetches it and shows it, in the list and on the page.
    const laptop = await device(reader.user.email, reader.password);
    await laptop.goto(`${baseUrl}/library`);
    await syncNow(laptop);
    const listed = await shownCover(laptop, 'table[aria-label="Books"]');
    expect(listed.src).toMatch(/^blob:/);
    await laptop.getByRole('link', { name: /The Lantern Keeper/ }).click();
    const fetched = await shownCover(laptop, 'article.book');
    expect(fetched.naturalWidth).toBe(400);
    expect(fetched.naturalHeight).toBe(600);
  });

  it('refuses a file that is not an image with a clear message, and the book saves without a cover', async () => {
    const { baseUrl } = harness.server;
    const reader = await registerThroughApi(baseUrl, 'Tomasz Wren');
    const page = await device(reader.user.email, reader.password);

    await page.goto(`${baseUrl}/library/new`);
    await page
      .getByLabel('Choose a cover image')
      .setInputFiles({ name: 'notes.png', mimeType: 'image/png', buffer: Buffer.from('Chapter one: notes, not a picture') });
    await page.getByRole('alert').filter({ hasText: 'This file is not an image Lamplight can read' }).waitFor();
    await fillBook(page, { title: 'A Quiet Harbour' });

    await page.locator('article.book ll-book-cover .placeholder').waitFor();
    expect(await page.locator('article.book ll-book-cover .placeholder').textContent()).toContain('AQ');
    expect(await page.locator('article.book ll-book-cover img').count()).toBe(0);
  });
});
