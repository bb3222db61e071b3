import { type ComponentFixture, TestBed } from '@angular/core/testing';

import type { Session } from '@shared/sync/schema/collections';

import { JournalStore } from '../../../core/data/journal-store';
import { CLOCK, fixedClock } from '../../../core/time/clock';
import { BROWSER_LOCALE } from '../../../core/settings/reader-settings';
import { TIME_ZONE } from '../../../core/time/time-zone';
import { ReadingLog } from './reading-log';
import { waitFor, openTestJournal, type TestJournal } from '../../../core/testing/test-journal';
import { addSession } from '../../../core/testing/seed';

/**
 * The same session, 2026-03-08 07:30–08:00 UTC, seen from two zones. IANA tz database: Los
 * Angeles is UTC−8 until 02:00 on 8 March 2026 (then UTC−7), so it is 23:30–00:00 on 7 March
 * there; Tokyo is UTC+9, 16:30–17:00 on 8 March. "Now" is 12:00 UTC: 05:00 on 8 March in Los
 * Angeles, 21:00 on 8 March in Tokyo.
 */
describe('ReadingLog', () => {
  const NOW = Date.parse('2026-03-08T12:00:00Z');
  let fixture: ComponentFixture<ReadingLog>;
  let store: JournalStore;
  let journal: TestJournal;

  const element = (): HTMLElement => fixture.nativeElement;
  const shown = (css: string) => element().querySelector(css)?.textContent?.trim();
  const level = (day: string) => /level-(\d)/.exec(element().querySelector(`ll-year-heatmap [data-day="${day}"]`)?.className ?? '')?.[1];

  const until = (check: () => unknown, what: string) => waitFor(fixture, check, what);

  function setUp(timeZone: string): void {
    beforeEach(async () => {
      journal = openTestJournal([
        { provide: TIME_ZONE, useValue: timeZone },
        { provide: CLOCK, useValue: fixedClock(NOW) },
        { provide: BROWSER_LOCALE, useValue: 'en-GB' },
      ]);
      store = journal.store;
    });

    afterEach(async () => {
      await journal.close();
    });
  }

  const read = (bookId: string, startedAt: string, minutes: number, from: number, to: number, extra: Partial<Session> = {}) =>
    addSession(store, bookId, startedAt, minutes, from, to, extra);

  async function showWithTheSession(): Promise<void> {
    const bookId = await store.create('books', { title: 'The Salt Road', format: 'print', pageCount: 300 });
    await read(bookId, '2026-03-08T07:30:00Z', 30, 0, 20);
    fixture = TestBed.createComponent(ReadingLog);
    await until(() => element().querySelector('ll-year-heatmap .day.level-3'), 'the log');
  }

  describe('in Los Angeles', () => {
    setUp('America/Los_Angeles');

    it('counts the session on 7 March: nothing yet today, and a streak still alive from yesterday', async () => {
      await showWithTheSession();
      expect(level('2026-03-07')).toBe('3'); // 30 minutes reach level 3 (HEATMAP_THRESHOLDS)
      expect(level('2026-03-08')).toBe('0');
      expect(shown('.today')).toBe('0 min · 0 pages');
      expect(shown('.current-streak')).toBe('1 day');
      expect(shown('.longest-streak')).toBe('1 day');
    });

    it('lays out 2026 as 365 days, with a summary and month totals as its text', async () => {
      await showWithTheSession();
      // The calendars' layout itself is checked in year-heatmap-layout.spec.ts.
      expect(element().querySelectorAll('ll-year-heatmap [data-day]').length).toBe(365);
      expect(element().querySelectorAll('ll-year-heatmap .month').length).toBe(12);
      expect(element().querySelector('ll-year-heatmap .months')?.getAttribute('aria-hidden')).toBe('true');
      expect(element().querySelector('ll-year-heatmap ul.legend')?.textContent).toContain('an hour or more');
      expect(shown('ll-year-heatmap figcaption')).toBe('1 of 365 days with reading in 2026, 30 min in all. The fullest day: 7 March, 30 min.');
      const rows = [...element().querySelectorAll('table tbody tr')].map((row) => [...row.children].map((cell) => cell.textContent?.trim()));
      expect(rows.length).toBe(12);
      expect(rows[2]).toEqual(['March', '1', '30 min']);
      expect(rows[1]).toEqual(['February', '0', '0 min']);
    });

    it('keeps streaks across days, and pages for print only', async () => {
      const bookId = await store.create('books', { title: 'The Salt Road', format: 'print', pageCount: 300 });
      const ebookId = await store.create('books', { title: 'Glass Orchard', format: 'ebook' });
      // Local evenings 1–3 March (19:00 PST = 03:00 UTC the next day), then 5–8 March.
      for (const day of ['02', '03', '04', '06', '07', '08']) await read(bookId, `2026-03-${day}T03:00:00Z`, 20, 0, 10);
      await read(ebookId, '2026-03-08T11:00:00Z', 15, 10, 30, { format: 'ebook' }); // 04:00 PDT today: percent, not pages
      fixture = TestBed.createComponent(ReadingLog);
      await until(() => shown('.current-streak') === '4 days', 'the streak');
      expect(shown('.longest-streak')).toBe('4 days');
      expect(shown('.today')).toBe('15 min · 0 pages');
    });
  });

  describe('in Tokyo', () => {
    setUp('Asia/Tokyo');

    it('counts the same session on 8 March, today', async () => {
      await showWithTheSession();
      expect(level('2026-03-08')).toBe('3');
      expect(level('2026-03-07')).toBe('0');
      expect(shown('.today')).toBe('30 min · 20 pages');
      expect(shown('.current-streak')).toBe('1 day');
    });
  });
});
