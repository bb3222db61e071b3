import fc from 'fast-check';
import { isoWeeksInYear } from './iso-weeks-in-year';
import { expectProperty } from '../testing/expect-property';

/** WHATWG HTML, "week number of the last day", with weekdays from plain ECMAScript Date. */
function whatwgWeeksInYear(year: number): number {
  const jan1 = new Date(0);
  jan1.setUTCFullYear(year, 0, 1); // setUTCFullYear, unlike Date.UTC, keeps years 0–99 as they are
  const weekday = jan1.getUTCDay(); // 0 = Sunday … 3 = Wednesday, 4 = Thursday
  const leap = year % 400 === 0 || (year % 4 === 0 && year % 100 !== 0);
  return weekday === 4 || (weekday === 3 && leap) ? 53 : 52;
}

describe('isoWeeksInYear', () => {
  it('gives 53 weeks to exactly 2004, 2009, 2015, 2020, 2026, 2032 and 2037 in 2000–2040', () => {
    // Wikipedia, "ISO week date", list of the 71 long years in the 400-year cycle; the same years
    // follow from the WHATWG HTML rule (Jan 1 a Thursday, or a Wednesday in a leap year).
    const long = [];
    for (let year = 2000; year <= 2040; year++) if (isoWeeksInYear(year) === 53) long.push(year);
    expect(long).toEqual([2004, 2009, 2015, 2020, 2026, 2032, 2037]);
  });

  it('gives 2026 53 weeks', () => {
    // WHATWG HTML "week number of the last day": 1 January 2026 is a Thursday.
    expect(isoWeeksInYear(2026)).toBe(53);
    // date-fns docs, getISOWeeksInYear example: ISO week-numbering year 2015 has 53 weeks.
    expect(isoWeeksInYear(2015)).toBe(53);
    expect(isoWeeksInYear(2027)).toBe(52);
  });

  it('follows the WHATWG HTML rule for every year 1–9999', () => {
    // WHATWG HTML §2.3.5.8 (week-number-of-the-last-day): 53 weeks when 1 January is a Thursday,
    // or a Wednesday in a leap year; otherwise 52.
    expectProperty(
      fc.property(fc.integer({ min: 1, max: 9999 }), (year) => {
        expect(isoWeeksInYear(year)).toBe(whatwgWeeksInYear(year));
      }),
      { numRuns: 1000 },
    );
  });

  it('has 71 long years in any 400-year cycle', () => {
    // Wikipedia, "ISO week date": the Gregorian 400-year cycle has 71 years with 53 weeks.
    let long = 0;
    for (let year = 1601; year <= 2000; year++) if (isoWeeksInYear(year) === 53) long++;
    expect(long).toBe(71);
  });

  it('refuses years it cannot name', () => {
    expect(() => isoWeeksInYear(2026.5)).toThrowError(RangeError);
    expect(() => isoWeeksInYear(0)).toThrowError(RangeError);
    expect(() => isoWeeksInYear(10000)).toThrowError(RangeError);
  });
});
