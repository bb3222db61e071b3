import { randomUUID } from 'node:crypto';

import type { Page } from 'playwright-core';

import { fieldChange, SyncClient } from '../support/sync-client';
import { useServerAndBrowser } from './support/harness';
import { arrivalInIndexedDb } from './support/indexed-db';
import { registerThroughApi, signInThroughUi } from './support/reader';

describe('Live updates in the browser', () => {
  const harness = useServerAndBrowser();
  let page: Page;
  afterEach(() => page?.context().close());

  it('shows a book another device pushed without Sync now, long before the minute-long periodic pull', async () => {
    const reader = await registerThroughApi(harness.server.baseUrl, 'Petra Lindqvist');
    page = await (await harness.browser.newContext()).newPage();
    const streams: string[] = [];
    page.on('request', (req) => req.url().endsWith('/api/sync/events') && streams.push(req.headers()['authorization'] ?? ''));
    await signInThroughUi(page, harness.server.baseUrl, reader.user.email, reader.password);
    await page.goto(`${harness.server.baseUrl}/library`);
    await page.waitForFunction(() => true);
    // The page opened its stream with the bearer header (never a token in the URL).
    for (let i = 0; i < 100 && streams.length === 0; i++) await new Promise((resolve) => setTimeout(resolve, 50));
    expect(streams[0]).toMatch(/^Bearer /);

    const row = randomUUID();
    const wall = Date.now();
    const otherDevice = new SyncClient(harness.server.baseUrl, reader.accessToken);
    const pushedAt = Date.now();
    const pushed = await otherDevice.push([
      fieldChange(row, 'title', 'The Lantern Keeper’s Almanac', { wall, node: 'phone' }),
      fieldChange(row, 'authors', ['Odile Varnsworth'], { wall, node: 'phone' }),
      fieldChange(row, 'format', 'print', { wall, node: 'phone' }),
      fieldChange(row, 'status', 'tbr', { wall, node: 'phone' }),
    ]);
    expect(pushed.status).toBe(200);

    const arrivedAt = await arrivalInIndexedDb(page, {
      userId: reader.user.id,
      store: 'books',
      rowId: row,
      field: 'title',
      value: 'The Lantern Keeper’s Almanac',
      timeoutMs: 15_000,
    });
    // The periodic pull runs once a minute; only the poke brings it this soon.
    expect(arrivedAt - pushedAt).toBeLessThan(15_000);
    await page.getByRole('link', { name: /The Lantern Keeper’s Almanac/ }).waitFor({ timeout: 5000 });
  }, 60_000);
});
