import { DailyLogEntry } from '../reading-log/log-session';
import { yearGoalPacing } from './year-goal-pacing';
import { inventedFinish as finished } from '../challenges/testing/invented-book';

describe('yearGoalPacing', () => {
  // Invented: 5 books finished in 2026 (one in the last 28 days), one on New Year's Eve 2025.
  const books = ['2025-12-31', '2026-01-20', '2026-02-14', '2026-03-30', '2026-05-02', '2026-06-10'].map((day, n) => finished(`b${n}`, day));
  const log: DailyLogEntry[] = [
    { day: '2025-12-31', minutes: 100, pages: 999 },
    { day: '2026-02-10', minutes: 0, pages: 1220 },
    { day: '2026-06-20', minutes: 600, pages: 280 },
  ];

  it('paces each unit with a target, from the year so far and the last 28 days', () => {
    const rows = yearGoalPacing({ targets: { books: 12, pages: 3000 }, year: 2026, today: '2026-07-01', finished: books, log });
    expect(rows.map((row) => row.unit)).toEqual(['books', 'pages']);

    const [bookRow, pageRow] = rows;
    // Hand (rules in goal-pacing.ts): 181 days gone, so 12 × 181 / 365 = 5.951 expected; 5 read;
    // half a book of tolerance (a week would be 0.23) → behind; 7 left over 184 days = 0.266 a week;
    // 1 book from 4 June to 1 July → 1/28 a day → 5 + 184/28 = 11.571 by 31 December.
    expect(bookRow.pacing.actual).toBe(5);
    expect(bookRow.pacing.expectedByToday).toBeCloseTo(5.951, 3);
    expect(bookRow.pacing.status).toBe('behind');
    expect(bookRow.pacing.neededPerWeek!).toBeCloseTo(0.266, 3);
    expect(bookRow.pacing.forecastYearEnd!).toBeCloseTo(11.571, 3);
    expect(bookRow.message).toBe('About 0.3 books a week from now gets you there');

    // Hand: 1220 + 280 = 1500 pages in 2026; expected 3000 × 181 / 365 = 1487.671; a week's
    // tolerance 3000 × 7 / 365 = 57.5 → on track; 280 pages in the last 28 days = 10 a day →
    // 1500 + 184 × 10 = 3340.
    expect(pageRow.pacing.actual).toBe(1500);
    expect(pageRow.pacing.expectedByToday).toBeCloseTo(1487.671, 3);
    expect(pageRow.pacing.status).toBe('on-track');
    expect(pageRow.pacing.forecastYearEnd!).toBeCloseTo(3340, 9);
    expect(pageRow.message).toBe('Right on an even pace for 3,000 pages');
  });

  it('has no rows without targets', () => {
    expect(yearGoalPacing({ targets: {}, year: 2026, today: '2026-07-01', finished: books, log })).toEqual([]);
  });

  it('closes a past year at what was read', () => {
    // Product rule in goalPacing: after the year, the forecast is the total.
    const [row] = yearGoalPacing({ targets: { minutes: 1000 }, year: 2026, today: '2027-02-01', finished: books, log });
    expect(row.pacing.forecastYearEnd).toBe(600);
    expect(row.message).toBe('The year closed at 600 of 1,000 minutes');
  });
});
