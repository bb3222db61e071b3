import { randomUUID } from 'node:crypto';
import { readFileSync } from 'node:fs';

import type { Page } from 'playwright-core';

import type { FieldChange } from '../../shared/api/sync';
import { fieldChange, SyncClient } from '../support/sync-client';
import { seriousViolations } from './support/axe';
import { useServerAndBrowser } from './support/harness';
import { registerThroughApi, signInThroughUi } from './support/reader';
import { waitForOfflineReady } from './support/service-worker';

/** The words of an element as laid out (blocks apart), spaces squeezed. */
async function words(page: Page, selector: string): Promise<string> {
  return (await page.locator(selector).first().innerText()).replace(/\s+/g, ' ').trim();
}

/** The summary (text alternative) of the chart in the section headed `heading`. */
function summaryUnder(page: Page, heading: string) {
  return page.locator('section', { has: page.getByRole('heading', { name: heading, exact: true }) }).locator('figcaption');
}

/** Width and height from a PNG's IHDR chunk (PNG specification, ISO/IEC 15948 §11.2.2). */
function pngSize(bytes: Buffer): { width: number; height: number } {
  return { width: bytes.readUInt32BE(16), height: bytes.readUInt32BE(20) };
}

describe('Insights, offline', () => {
  const harness = useServerAndBrowser();

  it('draws the year from synced books and sessions, with text for each chart, and saves the review as a PNG', async () => {
    const { baseUrl } = harness.server;
    const reader = await registerThroughApi(baseUrl, 'Isolde Varga');
    const year = new Date().getUTCFullYear();

    // An invented year, pushed as another device of the reader would: three finished books
    // (two in March), one on the TBR, and three timed print sessions.
    const wall = Date.now();
    const changes: FieldChange[] = [];
    const book = (fields: Record<string, unknown>) => {
      const id = randomUUID();
      for (const [field, value] of Object.entries(fields)) changes.push(fieldChange(id, field, value, { wall, node: 'other-device' }));
      return id;
    };
    const finishedAt = (day: string) => ({ status: 'finished', statusChangedAt: `${year}-${day}T12:00:00.000Z` });
    const salt = book({
      title: 'Salt Orchard',
      authors: ['Mirela Quist'],
      format: 'print',
      pageCount: 412,
      genres: ['Fantasy'],
      tags: ['comfort'],
      rating: 4.5,
      ...finishedAt('01-20'),
    });
    book({
      title: 'The Long Ferry',
      authors: ['Tobin Asare'],
      format: 'audiobook',
      genres: ['fantasy', 'Sea stories'],
      tags: [],
      rating: 5,
      ...finishedAt('03-05'),
    });
    const lanterns = book({
      title: 'Nine Lanterns',
      authors: ['Ines Halloran'],
      format: 'print',
      pageCount: 188,
      genres: ['Poetry'],
      tags: ['comfort'],
      rating: 5,
      ...finishedAt('03-20'),
    });
    book({ title: 'Glass Weather', authors: ['Oskar Lind'], format: 'ebook', genres: ['Essays'], tags: [], status: 'tbr' });
    const session = (bookId: string, day: string, minutes: number, from: number, to: number) => {
      const id = randomUUID();
      const startedAt = `${year}-${day}T18:00:00.000Z`;
      const endedAt = new Date(Date.parse(startedAt) + minutes * 60_000).toISOString();
      const fields = { bookId, format: 'print', startedAt, endedAt, activeMinutes: minutes, fromPosition: from, toPosition: to, source: 'manual' };
      for (const [field, value] of Object.entries(fields)) changes.push(fieldChange(id, field, value, { wall, node: 'other-device' }, 'sessions'));
    };
    session(salt, '01-10', 60, 0, 40);
    session(salt, '01-11', 30, 40, 60);
    session(lanterns, '03-18', 45, 0, 45);
    const pushed = await new SyncClient(baseUrl, reader.accessToken).push(changes);
    expect(pushed.status).toBe(200);

    const context = await harness.browser.newContext({ timezoneId: 'UTC', acceptDownloads: true });
    const page = await context.newPage();
    await signInThroughUi(page, baseUrl, reader.user.email, reader.password);
    await waitForOfflineReady(page, baseUrl);
    // The pull has landed once the library shows the last book.
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Library' }).click();
    await page.getByText('Glass Weather').first().waitFor();
    await context.setOffline(true);

    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Insights' }).click();
    await page.getByRole('heading', { name: `Insights for ${year}` }).waitFor();
    await summaryUnder(page, 'Month by month').filter({ hasText: 'March' }).waitFor();

    // Worked by hand from the data above: 1 book in January, 2 in March.
    expect(await summaryUnder(page, 'Month by month').textContent()).toBe(`3 books in ${year}; the most in March: 2 books.`);
    await page
      .getByRole('radio', { name: 'Minutes' })
      .or(page.getByRole('button', { name: 'Minutes' }))
      .click();
    // 60 + 30 in January, 45 in March.
    await summaryUnder(page, 'Month by month').filter({ hasText: 'minutes' }).waitFor();
    expect(await summaryUnder(page, 'Month by month').textContent()).toBe(`135 minutes in ${year}; the most in January: 90 minutes.`);
    expect(await summaryUnder(page, 'Formats').textContent()).toBe(`3 books finished in ${year}: 2 print, 1 audiobook.`);
    // (4.5 + 5 + 5) / 3 = 4.83…, shown to one decimal; the middle of 4.5, 5, 5 is 5.
    expect(await summaryUnder(page, 'Ratings').textContent()).toBe('3 books rated, 4.8 stars on average (the middle rating: 5).');
    // "Fantasy" and "fantasy" are one genre; ties in alphabetical order.
    expect(await summaryUnder(page, 'Genres').textContent()).toBe('Most read genre: Fantasy (2 books), then Poetry (1), Sea stories (1).');
    expect(await summaryUnder(page, 'Tags').textContent()).toBe('Most read tag: comfort (2 books).');
    // 60 pages in 90 minutes (40 an hour) in January, 45 in 45 (60) in March; 105 in 135 ≈ 47.
    expect(await summaryUnder(page, 'Pace').textContent()).toBe(`47 pages an hour across ${year}, from 40 in January to 60 in March.`);
    // Gregorian rule: a year divisible by 4 and not by 100, or by 400, has 366 days.
    const days = (year % 4 === 0 && year % 100 !== 0) || year % 400 === 0 ? 366 : 365;
    // The day is written in the browser's locale (the reader chose none): 10 January or January 10.
    expect(await summaryUnder(page, `Every day of ${year}`).textContent()).toMatch(
      new RegExp(`^3 of ${days} days with reading in ${year}, 2 h 15 min in all\\. The fullest day: (10 January|January 10), 1 h 00 min\\.$`),
    );
    expect(await page.locator('ll-year-heatmap .day.level-4').count()).toBe(1);

    // The charts are drawn, and each has its values as a table one tap away.
    const canvas = page.locator('section', { has: page.getByRole('heading', { name: 'Formats' }) }).locator('canvas');
    expect((await canvas.boundingBox())?.height).toBeGreaterThan(100);
    const monthly = page.locator('section', { has: page.getByRole('heading', { name: 'Month by month' }) });
    await monthly.getByText('Show as a table').click();
    expect(await words(page, 'section:has(#monthly-heading) tbody tr:nth-child(1)')).toBe('Jan 90');
    expect(await words(page, 'section:has(#monthly-heading) tbody tr:nth-child(2)')).toBe('Feb 0');
    expect(await seriousViolations(page)).toEqual([]);

    // The year's shelf, offline, saved as an image.
    await page.getByRole('link', { name: `Your ${year} shelf` }).click();
    await page.getByRole('heading', { name: `Isolde Varga’s ${year} shelf` }).waitFor();
    expect(await page.locator('ul.shelf button.spine').count()).toBe(3);
    const sentences = await words(page, '.words');
    expect(sentences).toContain(`Three books stand on your ${year} shelf`);
    expect(sentences).toContain('You read on 3 days, 2 of them in a row at best');
    expect(sentences).toContain('January was your fullest month, with 90 minutes.');
    expect(sentences).toContain('The tallest spine is Salt Orchard, at 412 pages.');
    expect(await seriousViolations(page)).toEqual([]);

    const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'Save as image' }).click()]);
    expect(download.suggestedFilename()).toBe(`lamplight-${year}-shelf.png`);
    const png = readFileSync((await download.path()) as string);
    // The eight-byte PNG signature (ISO/IEC 15948 §5.2).
    expect(png.subarray(0, 8).toString('hex')).toBe('89504e470d0a1a0a');
    const card = await page.locator('article.card').boundingBox();
    // Drawn at twice the CSS pixels.
    expect(pngSize(png).width).toBe(Math.round((card?.width ?? 0) * 2));
    await page.getByText(`Saved as lamplight-${year}-shelf.png`).waitFor();
    await context.close();
  });
});
