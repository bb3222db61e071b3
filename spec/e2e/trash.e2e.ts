import { randomUUID } from 'node:crypto';

import type { BrowserContext, Page } from 'playwright-core';

import { SyncClient, fieldChange } from '../support/sync-client';
import { seriousViolations } from './support/axe';
import { useServerAndBrowser } from './support/harness';
import { fillBook, syncNow } from './support/library';
import { registerThroughApi, signInThroughUi } from './support/reader';
import { waitForOfflineReady } from './support/service-worker';

describe('Trash across two devices', () => {
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

  /** A book with two sessions, written by a third device of the reader before the spec's two start. */
  async function seedBook(accessToken: string): Promise<string> {
    const bookId = randomUUID();
    const wall = Date.now() - 3_600_000;
    const session = (id: string, startedAt: string, to: number) =>
      Object.entries({
        bookId,
        format: 'print',
        startedAt,
        endedAt: startedAt.replace('T09', 'T10'),
        activeMinutes: 60,
        fromPosition: to - 30,
        toPosition: to,
        source: 'manual',
        deleted: false,
      }).map(([field, value]) => fieldChange(id, field, value, { wall, node: 'desk' }, 'sessions'));
    const book = Object.entries({
      title: 'The Orchard Under Snow',
      authors: ['Tamsin Ferrier'],
      format: 'print',
      status: 'reading',
      pageCount: 280,
      deleted: false,
    });
    const pushed = await new SyncClient(harness.server.baseUrl, accessToken).push([
      ...book.map(([field, value]) => fieldChange(bookId, field, value, { wall, node: 'desk' })),
      ...session(randomUUID(), '2026-11-02T09:00:00.000Z', 30),
      ...session(randomUUID(), '2026-11-03T09:00:00.000Z', 60),
    ]);
    expect(pushed.status).toBe(200);
    return bookId;
  }

  afterAll(async () => {
    for (const context of contexts) await context.close();
  });

  it('keeps a book deleted offline on one device while another edits it, shows it in Trash with a note, and restores its sessions', async () => {
    const reader = await registerThroughApi(harness.server.baseUrl, 'Odile Brennan');
    const bookId = await seedBook(reader.accessToken);
    const bookUrl = `${harness.server.baseUrl}/library/${bookId}`;
    const laptop = await device(reader.user.email, reader.password);
    const tablet = await device(reader.user.email, reader.password);
    for (const page of [laptop, tablet]) {
      await syncNow(page);
      await page.goto(bookUrl);
      await page.locator('li.session').nth(1).waitFor();
    }

    // The laptop, offline, deletes the book; the dialog says what goes with it.
    await laptop.context().setOffline(true);
    await laptop.getByRole('button', { name: 'Delete book' }).click();
    const dialog = laptop.getByRole('dialog');
    expect(await dialog.textContent()).toContain('Its 2 sessions go with it.');
    await dialog.getByRole('button', { name: 'Delete book' }).click();
    await laptop.waitForURL(`${harness.server.baseUrl}/library`);

    // Meanwhile the tablet, online, renames it and syncs.
    await tablet.goto(`${bookUrl}/edit`);
    await fillBook(tablet, { title: 'The Orchard Under Deep Snow' });
    await syncNow(tablet);

    // Both sync: the delete stands on both devices.
    await laptop.context().setOffline(false);
    await syncNow(laptop);
    await syncNow(tablet);
    await tablet.goto(bookUrl);
    await tablet.getByText('This book was deleted.').waitFor();

    // Trash shows the book with its sessions and the note about the later edit.
    await laptop.goto(`${harness.server.baseUrl}/settings`);
    await laptop.getByRole('link', { name: 'Open Trash' }).click();
    const item = laptop.locator('li', { hasText: 'The Orchard Under Deep Snow' });
    await item.waitFor();
    expect(await item.textContent()).toContain('With 2 sessions');
    expect(await item.textContent()).toContain('Edited on another device after it was deleted');
    expect(await seriousViolations(laptop)).toEqual([]);
    await laptop.setViewportSize({ width: 390, height: 844 });
    expect(await laptop.evaluate(() => document.documentElement.scrollWidth <= window.innerWidth))
      .withContext('no sideways scrolling at 390 px')
      .toBeTrue();

    // Restore brings the book back with both sessions, here and on the tablet.
    await laptop.getByRole('button', { name: 'Restore The Orchard Under Deep Snow' }).click();
    await laptop.getByText('Trash is empty.').waitFor();
    await syncNow(laptop);
    await syncNow(tablet);
    for (const page of [laptop, tablet]) {
      await page.goto(bookUrl);
      await page.locator('li.session').nth(1).waitFor();
      expect(await page.locator('li.session').count()).toBe(2);
      expect(await page.locator('article.book .title').textContent()).toContain('The Orchard Under Deep Snow');
    }
  }, 240_000);
});
