import { differenceInCalendarDays } from 'date-fns';
import { tz } from '@date-fns/tz';
import fc from 'fast-check';
import { dayIndex } from './day-index';
import { expectProperty } from '../testing/expect-property';

describe('dayIndex', () => {
  it('counts days from the Unix epoch', () => {
    // POSIX time: 2000-01-01T00:00:00Z is 946 684 800 s = 10 957 days after 1970-01-01.
    expect(dayIndex('1970-01-01')).toBe(0);
    expect(dayIndex('2000-01-01')).toBe(10957);
  });

  it('follows the Gregorian leap-year rule (ISO 8601 calendar)', () => {
    // Gregorian rule: every 4th year is leap, except centuries not divisible by 400.
    expect(dayIndex('2028-03-01') - dayIndex('2028-02-28')).toBe(2);
    expect(dayIndex('2100-03-01') - dayIndex('2100-02-28')).toBe(1);
    expect(dayIndex('2000-03-01') - dayIndex('2000-02-28')).toBe(2);
  });

  it('rejects malformed and impossible dates', () => {
    expect(() => dayIndex('2026-02-29')).toThrowError(RangeError);
    expect(() => dayIndex('2026-13-01')).toThrowError(RangeError);
    expect(() => dayIndex('2026-3-8')).toThrowError(RangeError);
    expect(() => dayIndex('2026-03-08T00:00:00Z')).toThrowError(RangeError);
  });

  it('agrees with date-fns differenceInCalendarDays (npm reference), years 0001–9999', () => {
    expectProperty(
      fc.property(fc.date({ min: new Date('0001-01-01T00:00:00Z'), max: new Date('9999-12-31T00:00:00Z'), noInvalidDate: true }), (date) => {
        const day = date.toISOString().slice(0, 10);
        const epoch = new Date('1970-01-01T00:00:00Z');
        return dayIndex(day) === differenceInCalendarDays(date, epoch, { in: tz('UTC') });
      }),
      { numRuns: 300 },
    );
  });
});
