import type { BrowserContext, Page } from 'playwright-core';

import { SyncClient } from '../support/sync-client';
import { seriousViolations } from './support/axe';
import { useServerAndBrowser } from './support/harness';
import { fillBook, syncNow } from './support/library';
import { registerThroughApi, signInThroughUi } from './support/reader';
import { waitForOfflineReady } from './support/service-worker';

describe('The reading timer', () => {
  const harness = useServerAndBrowser();
  const contexts: BrowserContext[] = [];

  afterEach(async () => {
    for (const context of contexts.splice(0)) await context.close();
  });

  /** A signed-in device, its clock faked (time flows, and can jump) when `fakeClock` is set. */
  async function device(email: string, password: string, fakeClock = false): Promise<Page> {
    const context = await harness.browser.newContext();
    contexts.push(context);
    const page = await context.newPage();
    if (fakeClock) await page.clock.install();
    await signInThroughUi(page, harness.server.baseUrl, email, password);
    await waitForOfflineReady(page, harness.server.baseUrl);
    return page;
  }

  async function addBook(page: Page, title: string): Promise<string> {
    await page.goto(`${harness.server.baseUrl}/library/new`);
    await fillBook(page, { title, authors: 'Nell Ashby', format: 'print', status: 'reading', pageCount: '320' });
    return new URL(page.url()).pathname.split('/').pop()!;
  }

  const elapsed = (page: Page) => page.locator('[role="timer"]');

  it('keeps counting through going offline and a reload, saves a session whose minutes match the clock, and syncs it to another device', async () => {
    const reader = await registerThroughApi(harness.server.baseUrl, 'Ines Calloway');
    const tablet = await device(reader.user.email, reader.password, true);
    await addBook(tablet, 'The Cartographer of Tides');

    await tablet.getByRole('button', { name: 'Start reading timer' }).click();
    await tablet.waitForURL(`${harness.server.baseUrl}/timer`);
    await tablet.getByRole('heading', { name: 'The Cartographer of Tides' }).waitFor();
    await elapsed(tablet)
      .filter({ hasText: /00:0\d/ })
      .waitFor();
    expect(await seriousViolations(tablet)).toEqual([]);

    // Offline, and the tab reloads: the timer is stored, not counted, so it carries on.
    await tablet.context().setOffline(true);
    await tablet.reload();
    await tablet.getByRole('heading', { name: 'The Cartographer of Tides' }).waitFor();
    await elapsed(tablet)
      .filter({ hasText: /00:\d\d/ })
      .waitFor();

    // 25 minutes later (the page's clock jumps; the timer reads it from its stored start).
    await tablet.clock.fastForward('25:00');
    await elapsed(tablet)
      .filter({ hasText: /25:\d\d/ })
      .waitFor();
    // The mini bar shows it elsewhere in the app.
    await tablet.goto(`${harness.server.baseUrl}/today`);
    await tablet.getByRole('link', { name: /25:\d\d The Cartographer of Tides/ }).click();
    await tablet.waitForURL(`${harness.server.baseUrl}/timer`);

    await tablet.getByRole('button', { name: 'Stop' }).click();
    const form = tablet.getByRole('dialog');
    await form.getByRole('heading', { name: 'You read for 25 minutes' }).waitFor();
    expect(await seriousViolations(tablet)).toEqual([]);
    await form.getByLabel('Page you reached').fill('120');
    await form.getByRole('button', { name: 'Save' }).click();
    await form.waitFor({ state: 'detached' });
    await tablet.getByText('No timer is running').waitFor();
    await tablet.getByText('The Cartographer of Tides · 25 minutes').waitFor();
    expect(await seriousViolations(tablet)).toEqual([]);

    // Online again: it reaches the server and another device.
    await tablet.context().setOffline(false);
    await syncNow(tablet);
    const { state } = await new SyncClient(harness.server.baseUrl, reader.accessToken).pullAll();
    const sessionKey = [...state.keys()].find((key) => key.startsWith('sessions/') && key.endsWith('/activeMinutes'))!;
    const minutes = state.get(sessionKey)?.value as number;
    // Started, 25 minutes of fast-forward, and the few real seconds the steps took.
    expect(minutes).toBeGreaterThanOrEqual(25);
    expect(minutes).toBeLessThan(26);
    expect(state.get(sessionKey.replace('activeMinutes', 'toPosition'))?.value).toBe(120);
    expect(state.get(sessionKey.replace('activeMinutes', 'source'))?.value).toBe('timer');

    const laptop = await device(reader.user.email, reader.password);
    await syncNow(laptop);
    await laptop.goto(`${harness.server.baseUrl}/timer`);
    await laptop.getByText('The Cartographer of Tides · 25 minutes').waitFor();
  });

  it('shows a timer running on another device, since when, and stops it from there', async () => {
    const reader = await registerThroughApi(harness.server.baseUrl, 'Tomas Reyes');
    const tablet = await device(reader.user.email, reader.password);
    await addBook(tablet, 'Small Rain');
    await tablet.getByRole('button', { name: 'Start reading timer' }).click();
    await tablet.waitForURL(`${harness.server.baseUrl}/timer`);
    await elapsed(tablet).waitFor();
    await syncNow(tablet);

    const laptop = await device(reader.user.email, reader.password);
    await syncNow(laptop);
    // The library offers the timer per row; this book's row now leads to the running timer.
    await laptop.goto(`${harness.server.baseUrl}/library`);
    await laptop.getByRole('link', { name: 'Open the timer for Small Rain' }).click();
    await laptop.waitForURL(`${harness.server.baseUrl}/timer`);
    // When it started, as the server has it, in this machine's local time (both browsers share it).
    const { state } = await new SyncClient(harness.server.baseUrl, reader.accessToken).pullAll();
    const startedAt = new Date([...state.entries()].find(([key]) => key.startsWith('timers/') && key.endsWith('/startedAt'))![1].value as string);
    const since = `${String(startedAt.getHours()).padStart(2, '0')}:${String(startedAt.getMinutes()).padStart(2, '0')}`;
    await laptop.getByText(new RegExp(`^Running on another device \\(.+\\) since ${since}$`)).waitFor();
    expect(await laptop.getByRole('button', { name: 'Pause' }).count()).toBe(0);
    expect(await seriousViolations(laptop)).toEqual([]);

    await laptop.getByRole('button', { name: 'Stop' }).click();
    const dialog = laptop.getByRole('dialog');
    await dialog.getByRole('heading', { name: /^You read for / }).waitFor();
    // Skip discards a session under a minute (and says so); a longer one is kept.
    const underAMinute = (await dialog.getByText('It was under a minute').count()) > 0;
    await dialog.getByRole('button', { name: 'Skip' }).click();
    if (underAMinute) await laptop.getByText('Under a minute, so the session was not kept.').waitFor();
    await laptop.getByText('No timer is running').waitFor();
    await syncNow(laptop);

    await syncNow(tablet);
    await tablet.getByText('No timer is running').waitFor();
    if (underAMinute) expect(await tablet.getByRole('heading', { name: 'Last session' }).count()).toBe(0);
    else await tablet.getByText(/Small Rain · \d+ minutes? ·/).waitFor();
  });
});
