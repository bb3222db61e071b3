import { DailyLogEntry } from '../reading-log/log-session';
import { amountsIn, amountsInLog, GoalSessionRow, monthlyAmounts, monthPeriod, recentRatesPerDay, sessionLog, yearPeriod } from './amounts-in';
import { inventedFinish as finished } from '../challenges/testing/invented-book';

// Offsets from the IANA tz database: Asia/Tokyo is UTC+9 all year; America/Los_Angeles is UTC−7
// (PDT) all through May 2026 (US DST, Energy Policy Act of 2005: 8 March to 1 November 2026).
const LA = 'America/Los_Angeles';
const TOKYO = 'Asia/Tokyo';

/** Rounds away the float noise of a split session. */
const rounded = (amounts: { books: number; pages: number; minutes: number }) => ({
  books: amounts.books,
  pages: Math.round(amounts.pages * 1e6) / 1e6,
  minutes: Math.round(amounts.minutes * 1e6) / 1e6,
});

describe('amountsIn', () => {
  // Invented sessions in May 2026, with their local times worked by hand from the offsets above.
  const sessions: GoalSessionRow[] = [
    // S1 print, 100 → 112: 12 pages. LA 11:00 on 4 May; Tokyo 03:00 on 5 May.
    { format: 'print', startedAt: '2026-05-04T18:00:00Z', endedAt: '2026-05-04T18:45:00Z', activeMinutes: 40, fromPosition: 100, toPosition: 112 },
    // S2 ebook, positions are percents: no pages. 10 May in both zones.
    { format: 'ebook', startedAt: '2026-05-10T12:00:00Z', endedAt: '2026-05-10T12:30:00Z', activeMinutes: 25, fromPosition: 10, toPosition: 30 },
    // S3 print, 0 → 20. Tokyo 23:30 on 31 May to 00:30 on 1 June: half to each month (30 min, 10 pages).
    // LA 07:30–08:30 on 31 May: all in May.
    { format: 'print', startedAt: '2026-05-31T14:30:00Z', endedAt: '2026-05-31T15:30:00Z', activeMinutes: 60, fromPosition: 0, toPosition: 20 },
    // S4 print, 50 → 55. LA 22:00 on 30 April (April); Tokyo 14:00 on 1 May (May).
    { format: 'print', startedAt: '2026-05-01T05:00:00Z', endedAt: '2026-05-01T05:15:00Z', activeMinutes: 15, fromPosition: 50, toPosition: 55 },
    // S5 deleted: left out.
    { format: 'print', startedAt: '2026-05-05T10:00:00Z', endedAt: '2026-05-05T11:00:00Z', activeMinutes: 60, fromPosition: 0, toPosition: 100, deleted: true },
    // S6 audiobook with no end: its minutes on the day it started (LA 03:00, Tokyo 19:00 on 20 May); positions are minutes, no pages.
    { format: 'audiobook', startedAt: '2026-05-20T10:00:00Z', activeMinutes: 30, fromPosition: 100, toPosition: 130 },
    // S7 print read backwards (80 → 60): no pages, its 10 minutes count.
    { format: 'print', startedAt: '2026-05-21T10:00:00Z', endedAt: '2026-05-21T10:10:00Z', activeMinutes: 10, fromPosition: 80, toPosition: 60 },
    // S8 no start: left out.
    { format: 'print', endedAt: '2026-05-22T10:10:00Z', activeMinutes: 10, fromPosition: 1, toPosition: 9 },
  ];
  const books = [finished('april', '2026-04-30'), finished('may1', '2026-05-01'), finished('may31', '2026-05-31'), finished('june', '2026-06-01')];
  const may = { start: '2026-05-01', end: '2026-05-31' };

  it('adds up May for a reader in Los Angeles', () => {
    // Hand: minutes S1 40 + S2 25 + S3 60 + S6 30 + S7 10 = 165; pages S1 12 + S3 20 = 32; books may1, may31.
    expect(rounded(amountsIn(may, books, sessions, LA))).toEqual({ books: 2, pages: 32, minutes: 165 });
    // Hand: April holds S4 alone, 15 minutes and 5 pages, and the book finished on 30 April.
    expect(rounded(amountsIn({ start: '2026-04-01', end: '2026-04-30' }, books, sessions, LA))).toEqual({ books: 1, pages: 5, minutes: 15 });
  });

  it('adds up the same sessions differently for a reader in Tokyo', () => {
    // Hand: minutes S1 40 + S2 25 + S3 30 + S4 15 + S6 30 + S7 10 = 150; pages S1 12 + S3 10 + S4 5 = 27.
    expect(rounded(amountsIn(may, books, sessions, TOKYO))).toEqual({ books: 2, pages: 27, minutes: 150 });
    // Hand: 1 June holds the other half of S3.
    expect(rounded(amountsIn({ start: '2026-06-01', end: '2026-06-30' }, books, sessions, TOKYO))).toEqual({ books: 1, pages: 10, minutes: 30 });
  });

  it('includes both ends of the period', () => {
    // One day, 31 May, in Los Angeles: S3 wholly (60 min, 20 pages) and the book of that day.
    expect(rounded(amountsIn({ start: '2026-05-31', end: '2026-05-31' }, books, sessions, LA))).toEqual({ books: 1, pages: 20, minutes: 60 });
  });

  it('reads the log per local day, so one log serves every period', () => {
    const log = sessionLog(sessions, TOKYO);
    expect(amountsInLog(may, books, log)).toEqual(amountsIn(may, books, sessions, TOKYO));
    expect(log.map((entry) => entry.day)).toEqual(['2026-05-01', '2026-05-05', '2026-05-10', '2026-05-20', '2026-05-21', '2026-05-31', '2026-06-01']);
  });

  it('is zero with nothing read', () => {
    expect(amountsIn(may, [], [], 'UTC')).toEqual({ books: 0, pages: 0, minutes: 0 });
  });
});

describe('recentRatesPerDay', () => {
  it('looks back 28 days, today included', () => {
    // Hand: 1 July 2026 − 27 days = 4 June (June has 30 days), so 4 June to 1 July is 28 days.
    const books = [finished('out', '2026-06-03'), finished('first', '2026-06-04'), finished('today', '2026-07-01')];
    const log: DailyLogEntry[] = [
      { day: '2026-06-03', minutes: 600, pages: 300 },
      { day: '2026-06-04', minutes: 280, pages: 56 },
      { day: '2026-07-01', minutes: 140, pages: 28 },
    ];
    const rates = recentRatesPerDay('2026-07-01', books, log);
    // Hand: 2 books / 28 days; (56 + 28) / 28 = 3 pages a day; (280 + 140) / 28 = 15 minutes a day.
    expect(rates.books).toBeCloseTo(2 / 28, 12);
    expect(rates.pages).toBe(3);
    expect(rates.minutes).toBe(15);
  });

  it('refuses a window of no days', () => {
    expect(() => recentRatesPerDay('2026-07-01', [], [], 0)).toThrowError(RangeError);
  });
});

describe('monthPeriod and yearPeriod', () => {
  it('knows the length of each month, leap Februaries included', () => {
    // Gregorian leap years (RFC 3339 Appendix C): 2028 is one, 2026 and 2100 are not, 2000 is.
    expect(monthPeriod(2026, 2)).toEqual({ start: '2026-02-01', end: '2026-02-28' });
    expect(monthPeriod(2028, 2)).toEqual({ start: '2028-02-01', end: '2028-02-29' });
    expect(monthPeriod(2100, 2).end).toBe('2100-02-28');
    expect(monthPeriod(2000, 2).end).toBe('2000-02-29');
    // "Thirty days hath September, April, June and November."
    expect([4, 6, 9, 11].map((month) => monthPeriod(2026, month).end.slice(8))).toEqual(['30', '30', '30', '30']);
    expect(monthPeriod(2026, 12)).toEqual({ start: '2026-12-01', end: '2026-12-31' });
    expect(monthPeriod(9999, 12).end).toBe('9999-12-31');
    expect(yearPeriod(2026)).toEqual({ start: '2026-01-01', end: '2026-12-31' });
  });

  it('refuses months and years that do not exist', () => {
    expect(() => monthPeriod(2026, 0)).toThrowError(RangeError);
    expect(() => monthPeriod(2026, 13)).toThrowError(RangeError);
    expect(() => monthPeriod(0, 1)).toThrowError(RangeError);
  });
});

describe('monthlyAmounts', () => {
  it('gives twelve months, January first', () => {
    const log: DailyLogEntry[] = [
      { day: '2026-01-31', minutes: 20, pages: 8 },
      { day: '2026-02-01', minutes: 30, pages: 10 },
      { day: '2027-01-01', minutes: 99, pages: 99 },
    ];
    const months = monthlyAmounts(2026, [finished('feb', '2026-02-28'), finished('dec', '2026-12-31')], log);
    expect(months.length).toBe(12);
    expect(months[0]).toEqual({ books: 0, pages: 8, minutes: 20 });
    expect(months[1]).toEqual({ books: 1, pages: 10, minutes: 30 });
    expect(months[11]).toEqual({ books: 1, pages: 0, minutes: 0 });
  });
});
