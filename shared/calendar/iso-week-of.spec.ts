import fc from 'fast-check';
import { isoWeekOf } from './iso-week-of';
import { expectProperty } from '../testing/expect-property';

/**
 * An independent reading of ISO 8601's rule with plain ECMAScript Date (no date-fns): a week
 * belongs to the year of its Thursday, and week 1 holds that year's first Thursday.
 */
function referenceIsoWeek(day: string): { year: number; week: number; weekday: number } {
  const date = new Date(`${day}T00:00:00Z`);
  const weekday = date.getUTCDay() === 0 ? 7 : date.getUTCDay();
  const thursday = new Date(date.getTime() + (4 - weekday) * 86_400_000);
  const year = thursday.getUTCFullYear();
  const jan1 = new Date(0);
  jan1.setUTCFullYear(year, 0, 1);
  const ordinal = Math.round((thursday.getTime() - jan1.getTime()) / 86_400_000);
  return { year, week: Math.floor(ordinal / 7) + 1, weekday };
}

describe('isoWeekOf', () => {
  it('puts the days around New Year in the right week-numbering year', () => {
    // Wikipedia, "ISO week date", table "Examples of contemporary dates around New Year's Day".
    expect(isoWeekOf('2008-12-29')).toEqual({ year: 2009, week: 1, weekday: 1 });
    expect(isoWeekOf('2010-01-03')).toEqual({ year: 2009, week: 53, weekday: 7 });
    expect(isoWeekOf('1977-01-01')).toEqual({ year: 1976, week: 53, weekday: 6 });
    expect(isoWeekOf('1978-01-02')).toEqual({ year: 1978, week: 1, weekday: 1 });
  });

  it('matches the Python documentation for date.isocalendar()', () => {
    // docs.python.org, datetime.date.isocalendar: 2004 begins on a Thursday, so ISO week 1 of
    // 2004 runs from Monday 29 Dec 2003 to Sunday 4 Jan 2004.
    expect(isoWeekOf('2003-12-29')).toEqual({ year: 2004, week: 1, weekday: 1 });
    expect(isoWeekOf('2004-01-04')).toEqual({ year: 2004, week: 1, weekday: 7 });
  });

  it('matches the PostgreSQL documentation for EXTRACT(week) and EXTRACT(isoyear)', () => {
    // postgresql.org docs, 9.9.1 EXTRACT, field "week": 2005-01-01 is in week 53 of 2004,
    // 2006-01-01 in week 52 of 2005, and 2012-12-31 in week 1 of 2013.
    expect(isoWeekOf('2005-01-01')).toEqual(jasmine.objectContaining({ year: 2004, week: 53 }));
    expect(isoWeekOf('2006-01-01')).toEqual(jasmine.objectContaining({ year: 2005, week: 52 }));
    expect(isoWeekOf('2012-12-31')).toEqual(jasmine.objectContaining({ year: 2013, week: 1 }));
    // 2004-12-31 is the Friday of that same Monday–Sunday week (weekday from Python's
    // isocalendar(), run while writing this spec: (2004, 53, 5)).
    expect(isoWeekOf('2004-12-31')).toEqual({ year: 2004, week: 53, weekday: 5 });
  });

  it('matches other published examples', () => {
    // pandas docs, Series.dt.isocalendar example: 2010-01-01 → year 2009, week 53, day 5.
    expect(isoWeekOf('2010-01-01')).toEqual({ year: 2009, week: 53, weekday: 5 });
    // Microsoft Kusto docs, week_of_year() examples: 2020-12-31 → 53, 2020-06-15 → 25,
    // 1970-01-01 → 1, 2000-01-01 → 52.
    expect(isoWeekOf('2020-12-31').week).toBe(53);
    expect(isoWeekOf('2020-06-15').week).toBe(25);
    expect(isoWeekOf('1970-01-01').week).toBe(1);
    expect(isoWeekOf('2000-01-01').week).toBe(52);
    // Markus Kuhn, "A summary of the international standard date and time notation":
    // the first week of 1997 lasts from 1996-12-30 to 1997-01-05.
    expect(isoWeekOf('1996-12-30')).toEqual({ year: 1997, week: 1, weekday: 1 });
    expect(isoWeekOf('1997-01-05')).toEqual({ year: 1997, week: 1, weekday: 7 });
  });

  it('agrees with the ISO 8601 Thursday rule on any day', () => {
    // Property against referenceIsoWeek above (ISO 8601-1:2019 §3.2.2: week 1 holds the first Thursday).
    expectProperty(
      fc.property(fc.date({ min: new Date('1583-01-01T00:00:00Z'), max: new Date('9999-12-24T00:00:00Z'), noInvalidDate: true }), (date) => {
        const day = date.toISOString().slice(0, 10);
        expect(isoWeekOf(day)).toEqual(referenceIsoWeek(day));
      }),
      { numRuns: 500 },
    );
  });

  it('refuses text that is not a calendar date', () => {
    expect(() => isoWeekOf('2026-02-30')).toThrowError(RangeError);
  });
});
