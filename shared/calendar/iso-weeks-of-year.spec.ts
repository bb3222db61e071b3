import fc from 'fast-check';
import { isoWeekOf } from './iso-week-of';
import { isoWeeksOfYear } from './iso-weeks-of-year';
import { expectProperty } from '../testing/expect-property';

describe('isoWeeksOfYear', () => {
  it('lists the 53 weeks of 2026, from 29 December 2025 to 3 January 2027', () => {
    // WHATWG HTML week rule: 1 January 2026 is a Thursday, so 2026 has 53 weeks. Python's
    // date.isocalendar(), run while writing: 2025-12-29 → (2026, 1, 1), 2027-01-03 → (2026, 53, 7).
    const weeks = isoWeeksOfYear(2026);
    expect(weeks.length).toBe(53);
    expect(weeks[0]).toEqual({ year: 2026, week: 1, monday: '2025-12-29', sunday: '2026-01-04' });
    expect(weeks[52]).toEqual({ year: 2026, week: 53, monday: '2026-12-28', sunday: '2027-01-03' });
  });

  it('starts 2004 on Monday 29 December 2003', () => {
    // docs.python.org, datetime.date.isocalendar: ISO week 1 of 2004 is 29 Dec 2003 – 4 Jan 2004.
    expect(isoWeeksOfYear(2004)[0]).toEqual({ year: 2004, week: 1, monday: '2003-12-29', sunday: '2004-01-04' });
  });

  it('starts 1997 on 1996-12-30', () => {
    // Markus Kuhn, "A summary of the international standard date and time notation".
    expect(isoWeeksOfYear(1997)[0]).toEqual({ year: 1997, week: 1, monday: '1996-12-30', sunday: '1997-01-05' });
  });

  it('covers a year with whole Monday–Sunday weeks and no gaps', () => {
    // ISO 8601: each week runs Monday (1) to Sunday (7), and a week-numbering year is 364 or 371
    // days (Wikipedia, "ISO week date").
    expectProperty(
      fc.property(fc.integer({ min: 1600, max: 2400 }), (year) => {
        const weeks = isoWeeksOfYear(year);
        weeks.forEach((span, index) => {
          expect(isoWeekOf(span.monday)).toEqual({ year, week: index + 1, weekday: 1 });
          expect(isoWeekOf(span.sunday)).toEqual({ year, week: index + 1, weekday: 7 });
        });
        const first = Date.parse(weeks[0].monday);
        const last = Date.parse(weeks[weeks.length - 1].sunday);
        expect((last - first) / 86_400_000 + 1).toBe(weeks.length * 7);
        expect([364, 371]).toContain(weeks.length * 7);
      }),
      { numRuns: 50 },
    );
  });
});
