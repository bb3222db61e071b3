import ICAL from 'ical.js';
import { readFile } from 'node:fs/promises';

import { seriousViolations } from './support/axe';
import { useServerAndBrowser } from './support/harness';
import { fillBook, syncNow } from './support/library';
import { registerThroughApi, signInThroughUi } from './support/reader';
import { waitForOfflineReady } from './support/service-worker';

describe('Loans, offline first', () => {
  const harness = useServerAndBrowser();

  it('borrows a book offline with a due date, sees it on Today and in Loans, downloads its .ics offline, syncs, and the calendar feed has it', async () => {
    const { baseUrl } = harness.server;
    const reader = await registerThroughApi(baseUrl, 'Tamsin Achterberg');
    const context = await harness.browser.newContext({ timezoneId: 'Europe/London', acceptDownloads: true });
    const page = await context.newPage();
    await signInThroughUi(page, baseUrl, reader.user.email, reader.password);
    await waitForOfflineReady(page, baseUrl);
    await context.setOffline(true);

    await page.goto(`${baseUrl}/library/new`);
    await fillBook(page, { title: 'The Ferryman’s Ledger', authors: 'Ines Waldgrave', status: 'reading', pageCount: '320' });
    // Tomorrow in the reader's zone (the browser's), as the app counts days.
    const tomorrow = await page.evaluate(() => {
      const date = new Date(Date.now() + 86_400_000);
      return new Intl.DateTimeFormat('en-CA', { timeZone: 'Europe/London' }).format(date);
    });
    await page.getByLabel('Due on', { exact: true }).fill(tomorrow);
    await page.getByRole('button', { name: 'Borrowed from a library' }).click();
    await page.getByText('Due tomorrow').first().waitFor();

    await page.goto(`${baseUrl}/today`);
    await page.getByRole('heading', { name: 'Loans needing you' }).waitFor();
    await page.getByRole('link', { name: 'The Ferryman’s Ledger' }).first().waitFor();

    await page.goto(`${baseUrl}/loans`);
    await page.getByRole('heading', { name: 'Loans', exact: true }).waitFor();
    await page.locator('ul.loans li').filter({ hasText: 'The Ferryman’s Ledger' }).getByText('Due tomorrow').waitFor();
    // The one-off .ics is made on the device, so it downloads while offline.
    const [download] = await Promise.all([
      page.waitForEvent('download'),
      page.getByRole('button', { name: 'Add to calendar: The Ferryman’s Ledger (.ics file)' }).click(),
    ]);
    expect(await readFile((await download.path())!, 'utf8')).toContain(`DTSTART;VALUE=DATE:${tomorrow.replace(/-/g, '')}\r\n`);
    expect(await seriousViolations(page)).toEqual([]);
    // Phone width: nothing wider than the screen.
    await page.setViewportSize({ width: 320, height: 720 });
    await page.waitForFunction(() => document.documentElement.scrollWidth <= window.innerWidth);

    await context.setOffline(false);
    await syncNow(page);

    const made = await fetch(`${baseUrl}/api/calendar-feed`, { method: 'POST', headers: { authorization: `Bearer ${reader.accessToken}` } });
    expect(made.status).toBe(201);
    const { path } = (await made.json()) as { path: string };
    const feed = await (await fetch(`${baseUrl}${path}`)).text();
    const [event] = new ICAL.Component(ICAL.parse(feed)).getAllSubcomponents('vevent');
    expect(event?.getFirstPropertyValue('summary')).toBe('Due back at the library: The Ferryman’s Ledger');
    expect((event?.getFirstPropertyValue('dtstart') as ICAL.Time).toString()).toBe(tomorrow);
    await context.close();
  }, 240_000);
});
