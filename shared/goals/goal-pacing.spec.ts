import fc from 'fast-check';
import { goalPacing } from './goal-pacing';
import { expectProperty } from '../testing/expect-property';

/** Whole days from 1 January to `day`, with plain ECMAScript Date (ECMA-262 Date.UTC: ms since epoch). */
function referenceDaysGone(day: string): number {
  const [year] = day.split('-').map(Number);
  return (Date.parse(day) - Date.UTC(year, 0, 1)) / 86_400_000;
}

describe('goalPacing', () => {
  describe('hand-worked examples', () => {
    it('52 books at the start of 1 July 2026: 181 of 365 days gone, about 25.8 books expected', () => {
      // Worked by hand: Jan 31 + Feb 28 + Mar 31 + Apr 30 + May 31 + Jun 30 = 181 days gone;
      // 2026 is not a leap year (RFC 3339 Appendix C rule). 52 × 181 / 365 = 25.786…
      // Python's date(2026, 7, 1).timetuple().tm_yday, run while writing, is 182: day 182, 181 gone.
      const pacing = goalPacing({ target: 52, actual: 22, year: 2026, today: '2026-07-01' });
      expect(pacing.daysElapsed).toBe(181);
      expect(pacing.daysInYear).toBe(365);
      expect(pacing.expectedByToday).toBeCloseTo(25.786, 3);
      expect(pacing.difference).toBeCloseTo(-3.786, 3);
      expect(pacing.status).toBe('behind');
      // Hand: 30 left over 184 days (today included) = 30 / (184 / 7) = 1.141 a week.
      expect(pacing.neededPerWeek!).toBeCloseTo(1.141, 3);
      // Hand: year-to-date average 22 / 181 a day, so 22 + 22 × 184 / 181 = 44.365 by 31 December.
      expect(pacing.forecastYearEnd!).toBeCloseTo(44.365, 3);
    });

    it('uses the recent pace for the forecast when it is given', () => {
      // Hand: 2 books in the last 28 days → 2/28 a day; 22 + 184 × 2/28 = 35.143.
      const pacing = goalPacing({ target: 52, actual: 22, year: 2026, today: '2026-07-01', recentRatePerDay: 2 / 28 });
      expect(pacing.forecastYearEnd!).toBeCloseTo(35.143, 3);
    });

    it('1 July 2028, a leap year: 182 of 366 days gone', () => {
      // Hand: Jan 31 + Feb 29 + Mar 31 + Apr 30 + May 31 + Jun 30 = 182; 2028 is divisible by 4 and
      // not a century (RFC 3339 Appendix C). 52 × 182 / 366 = 25.858.
      const pacing = goalPacing({ target: 52, actual: 26, year: 2028, today: '2028-07-01' });
      expect(pacing.daysElapsed).toBe(182);
      expect(pacing.daysInYear).toBe(366);
      expect(pacing.expectedByToday).toBeCloseTo(25.858, 3);
      expect(pacing.status).toBe('on-track');
    });

    it('1 January: nothing expected yet, no forecast without a recent pace', () => {
      // Hand: 0 days gone; 52 over 365 days = 52 / (365 / 7) = 0.997 a week.
      const pacing = goalPacing({ target: 52, actual: 0, year: 2026, today: '2026-01-01' });
      expect(pacing.daysElapsed).toBe(0);
      expect(pacing.expectedByToday).toBe(0);
      expect(pacing.status).toBe('on-track');
      expect(pacing.neededPerWeek!).toBeCloseTo(0.997, 3);
      expect(pacing.forecastYearEnd).toBeNull();
      // Hand: with a recent pace of 0.1 a day, 0 + 365 × 0.1 = 36.5.
      expect(goalPacing({ target: 52, actual: 0, year: 2026, today: '2026-01-01', recentRatePerDay: 0.1 }).forecastYearEnd!).toBeCloseTo(36.5, 9);
    });

    it('31 December: 364 days gone, one day left', () => {
      // Hand: 52 × 364 / 365 = 51.858; 1 book left in 1 day = 7 a week; forecast 51 + 51/364 = 51.140.
      const pacing = goalPacing({ target: 52, actual: 51, year: 2026, today: '2026-12-31' });
      expect(pacing.daysElapsed).toBe(364);
      expect(pacing.expectedByToday).toBeCloseTo(51.858, 3);
      expect(pacing.status).toBe('on-track');
      expect(pacing.neededPerWeek!).toBeCloseTo(7, 9);
      expect(pacing.forecastYearEnd!).toBeCloseTo(51.14, 2);
    });

    it('counts the day of the year as PostgreSQL does', () => {
      // postgresql.org docs, EXTRACT(DOY FROM TIMESTAMP '2001-02-16 20:38:40') → 47, so 46 days gone.
      expect(goalPacing({ target: 12, actual: 1, year: 2001, today: '2001-02-16' }).daysElapsed).toBe(46);
    });

    it('works the same for pages', () => {
      // Hand: 1 March 2026 → 31 + 28 = 59 days gone; 10 000 × 59 / 365 = 1616.438 pages.
      const pacing = goalPacing({ target: 10_000, actual: 1_500, year: 2026, today: '2026-03-01' });
      expect(pacing.expectedByToday).toBeCloseTo(1616.438, 3);
      // Tolerance: one week of an even pace = 10 000 × 7 / 365 = 191.8 pages; 116.4 short is within it.
      expect(pacing.status).toBe('on-track');
    });

    it('clamps days outside the year', () => {
      // Product decision: before the year nothing is expected; after it, the whole target is.
      const early = goalPacing({ target: 52, actual: 0, year: 2026, today: '2025-12-20' });
      expect(early.daysElapsed).toBe(0);
      const late = goalPacing({ target: 52, actual: 40, year: 2026, today: '2027-01-05' });
      expect(late.daysElapsed).toBe(365);
      expect(late.expectedByToday).toBe(52);
      expect(late.neededPerWeek).toBeNull();
      expect(late.forecastYearEnd).toBe(40);
    });
  });

  describe('on track means within a week of an even pace (half a unit at least)', () => {
    // Product decision (see goalPacing JSDoc). 52 books on 1 July 2026: expected 25.786, and a
    // week's worth is 52 × 7 / 365 = 0.997 books, so on track is 24.79 to 26.78 (hand-worked).
    const at = (actual: number) => goalPacing({ target: 52, actual, year: 2026, today: '2026-07-01' }).status;
    it('names the band around the even pace', () => {
      expect(at(24.5)).toBe('behind');
      expect(at(25)).toBe('on-track');
      expect(at(26.5)).toBe('on-track');
      expect(at(27)).toBe('ahead');
    });

    it('keeps half a book for small goals', () => {
      // 12 books on 1 July 2026: expected 5.951 (hand); a week would be 0.23 books, so the floor applies.
      const small = (actual: number) => goalPacing({ target: 12, actual, year: 2026, today: '2026-07-01' }).status;
      expect(small(5.5)).toBe('on-track');
      expect(small(5.4)).toBe('behind');
      expect(small(6.5)).toBe('ahead');
    });
  });

  describe('properties', () => {
    const dayOf = (year: number, offset: number) => new Date(Date.UTC(year, 0, 1 + offset)).toISOString().slice(0, 10);
    const year = fc.integer({ min: 1970, max: 2100 });
    const target = fc.double({ min: 1, max: 100_000, noNaN: true });
    const actual = fc.double({ min: 0, max: 100_000, noNaN: true });

    it('counts days gone as plain Date arithmetic does', () => {
      // Reference: ECMA-262 time values, one day = 86 400 000 ms.
      expectProperty(
        fc.property(year, fc.integer({ min: 0, max: 365 }), (y, offset) => {
          const today = dayOf(y, offset);
          fc.pre(today.startsWith(String(y)));
          expect(goalPacing({ target: 52, actual: 0, year: y, today }).daysElapsed).toBe(referenceDaysGone(today));
        }),
      );
    });

    it('expects more (never less) as the days go by', () => {
      expectProperty(
        fc.property(year, target, fc.integer({ min: -10, max: 380 }), fc.integer({ min: -10, max: 380 }), (y, t, a, b) => {
          const [early, late] = a <= b ? [a, b] : [b, a];
          const first = goalPacing({ target: t, actual: 0, year: y, today: dayOf(y, early) });
          const second = goalPacing({ target: t, actual: 0, year: y, today: dayOf(y, late) });
          expect(second.expectedByToday).toBeGreaterThanOrEqual(first.expectedByToday);
          expect(second.expectedByToday).toBeLessThanOrEqual(t);
        }),
      );
    });

    it('has difference = actual − expected, and a status that agrees with its sign', () => {
      expectProperty(
        fc.property(year, target, actual, fc.integer({ min: 0, max: 365 }), (y, t, done, offset) => {
          const pacing = goalPacing({ target: t, actual: done, year: y, today: dayOf(y, offset) });
          expect(pacing.difference).toBe(pacing.actual - pacing.expectedByToday);
          if (pacing.status === 'ahead') expect(pacing.difference).toBeGreaterThan(0);
          if (pacing.status === 'behind') expect(pacing.difference).toBeLessThan(0);
        }),
      );
    });

    it('asks per week for exactly what closes the gap by 31 December', () => {
      expectProperty(
        fc.property(year, target, actual, fc.integer({ min: 0, max: 364 }), (y, t, done, offset) => {
          const pacing = goalPacing({ target: t, actual: done, year: y, today: dayOf(y, offset) });
          const daysLeft = pacing.daysInYear - pacing.daysElapsed;
          expect(done + (pacing.neededPerWeek! * daysLeft) / 7).toBeCloseTo(Math.max(t, done), 6);
        }),
      );
    });
  });

  it('refuses nonsense input', () => {
    const base = { target: 52, actual: 0, year: 2026, today: '2026-07-01' };
    expect(() => goalPacing({ ...base, target: 0 })).toThrowError(RangeError);
    expect(() => goalPacing({ ...base, actual: -1 })).toThrowError(RangeError);
    expect(() => goalPacing({ ...base, actual: Number.NaN })).toThrowError(RangeError);
    expect(() => goalPacing({ ...base, recentRatePerDay: -0.1 })).toThrowError(RangeError);
    expect(() => goalPacing({ ...base, today: '2026-07-32' })).toThrowError(RangeError);
  });
});
