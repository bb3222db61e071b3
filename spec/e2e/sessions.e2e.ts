import type { Locator, Page } from 'playwright-core';

import { instantFromLocalDateTime } from '../../shared/calendar/local-date-time';
import { localDay } from '../../shared/calendar/local-day';
import { dayFromIndex } from '../../shared/reading-log/day-from-index';
import { dayIndex } from '../../shared/reading-log/day-index';
import { seriousViolations } from './support/axe';
import { useServerAndBrowser } from './support/harness';
import { bookFacts, fillBook } from './support/library';
import { registerThroughApi, signInThroughUi } from './support/reader';
import { valueWhen } from './support/settled';

/** The reader is in Tokyo (no DST, so the expected dates below hold whatever the date is). */
const ZONE = 'Asia/Tokyo';

/** Fills the session editor and saves. */
async function fillSession(page: Page, fields: { started: string; ended: string; from?: string; to?: string; mood?: string }): Promise<void> {
  await page.getByLabel('Started').fill(fields.started);
  await page.getByLabel('Ended').fill(fields.ended);
  if (fields.from !== undefined) await page.getByLabel('From page').fill(fields.from);
  if (fields.to !== undefined) await page.getByLabel('To page').fill(fields.to);
  if (fields.mood !== undefined) await page.getByLabel('How it felt').selectOption(fields.mood);
  await page.getByRole('button', { name: 'Save session' }).click();
}

/** Text as a reader sees it: runs of white space as one space. */
async function textOf(locator: Locator): Promise<string> {
  return ((await locator.textContent()) ?? '').replace(/\s+/g, ' ').trim();
}

/** A calendar date as Angular's `mediumDate` shows it in en-US ("Mar 19, 2026"). */
const mediumDate = (day: string) => new Intl.DateTimeFormat('en-US', { dateStyle: 'medium', timeZone: 'UTC' }).format(Date.parse(day));

describe('Reading sessions and the daily log', () => {
  const harness = useServerAndBrowser();

  it('keeps manual sessions, shows progress and a forecast on the book page and the log on Today; refuses impossible sessions', async () => {
    const { baseUrl } = harness.server;
    const reader = await registerThroughApi(baseUrl, 'Ingrid Sato');
    const context = await harness.browser.newContext({ timezoneId: ZONE, locale: 'en-US' });
    const page = await context.newPage();
    await signInThroughUi(page, baseUrl, reader.user.email, reader.password);

    const today = localDay(new Date().toISOString(), ZONE);
    const day = (offset: number) => dayFromIndex(dayIndex(today) + offset);
    await page.goto(`${baseUrl}/library/new`);
    await fillBook(page, { title: 'The Salt Road', authors: 'Wenna Harrow', pageCount: '300' });
    const bookUrl = page.url();

    await page.getByRole('link', { name: 'Add a session' }).click();
    await page.getByLabel('Started').waitFor();
    expect(await seriousViolations(page)).toEqual([]);
    await fillSession(page, { started: `${day(-2)}T19:00`, ended: `${day(-2)}T19:45`, from: '0', to: '30', mood: 'absorbed' });
    await page.locator('li.session').first().waitFor();
    expect((await bookFacts(page))['Status']).toBe('Reading'); // the first session of a TBR book

    await page.getByRole('link', { name: 'Add a session' }).click();
    await page.getByLabel('Started').waitFor();
    expect(await valueWhen(page.getByLabel('From page'), (value) => value === '30')).toBe('30'); // where the last one ended
    await fillSession(page, { started: `${day(-1)}T20:00`, ended: `${day(-1)}T20:30`, to: '60' });
    await page.waitForFunction(() => document.querySelectorAll('li.session').length === 2);

    // Progress in pages; no history yet, so typical speeds: Brysbaert (2019) 238 wpm at 275
    // words a page leave 240 pages in 277 min. 75 minutes over the three days up to today is
    // 25 a day: 11.1, so 12 days, today included.
    const section = page.locator('ll-book-reading');
    expect(await section.locator('.progress-line').textContent()).toContain('Page 60 of 300');
    expect(await page.getByRole('progressbar', { name: 'Progress through the book' }).getAttribute('aria-valuenow')).toBe('20');
    expect(await textOf(section.locator('.forecast'))).toContain(`About 4 h 37 min left · you should finish around ${mediumDate(day(11))}`);
    await section.getByText('From typical reading speeds (Brysbaert 2019)').waitFor();
    expect(await textOf(section.locator('li.session').first())).toContain('30 min · p. 30 → p. 60');
    expect(await seriousViolations(page)).toEqual([]);

    // An overlapping session and a 21-hour one are refused with their reasons; nothing is saved.
    await page.getByRole('link', { name: 'Add a session' }).click();
    await fillSession(page, { started: `${day(-1)}T20:15`, ended: `${day(-1)}T20:45`, to: '70' });
    const utc = (local: string) => instantFromLocalDateTime(local, ZONE)!.slice(11, 16);
    await page
      .getByRole('alert')
      .filter({ hasText: `It overlaps another session (${utc(`${day(-1)}T20:00`)}–${utc(`${day(-1)}T20:30`)} UTC)` })
      .waitFor();
    await fillSession(page, { started: `${day(-3)}T06:00`, ended: `${day(-2)}T03:00` });
    await page.getByRole('alert').filter({ hasText: 'A session cannot last more than 20 hours' }).waitFor();
    expect(await page.getByLabel('Ended').getAttribute('aria-invalid')).toBe('true');
    expect(await seriousViolations(page)).toEqual([]);
    await page.getByRole('link', { name: 'Cancel' }).click();
    await page.waitForURL(bookUrl);
    await page.locator('li.session').first().waitFor();
    expect(await page.locator('li.session').count()).toBe(2);

    // Today: the book in progress with its finish date, and the log.
    await page.goto(`${baseUrl}/today`);
    const log = page.locator('ll-reading-log');
    await log.locator('.current-streak').filter({ hasText: '2 days' }).waitFor();
    expect(await log.locator('.longest-streak').textContent()).toContain('2 days');
    expect(await log.locator('.today').textContent()).toContain('0 min · 0 pages');
    const heatmap = log.locator('ll-year-heatmap');
    // The heatmap renders after the book being read, once the browser is idle (a @defer): wait for its words.
    await heatmap
      .locator('figcaption')
      .filter({ hasText: /days with reading/ })
      .waitFor();
    expect(await heatmap.locator('figcaption').textContent()).toMatch(/^\d+ of 36[56] days with reading in \d{4}/);
    expect(await heatmap.locator('[data-day]').count()).toBe(Number(today.slice(0, 4)) % 4 === 0 ? 366 : 365);
    for (const reading of [day(-2), day(-1)].filter((d) => d.slice(0, 4) === today.slice(0, 4))) {
      expect(await heatmap.locator(`[data-day="${reading}"]`).getAttribute('class')).toContain('level-3'); // 45 and 30 min
    }
    expect(await textOf(page.locator('ll-in-progress li').first())).toContain(`The Salt Road · 20 % · finish around ${mediumDate(day(11))}`);
    expect(await seriousViolations(page)).toEqual([]);
    await context.close();
  });
});
