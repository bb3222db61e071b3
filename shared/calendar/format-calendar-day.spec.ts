import fc from 'fast-check';
import { formatCalendarDay } from './format-calendar-day';
import { parseCalendarDay } from './parse-calendar-day';
import { expectProperty } from '../testing/expect-property';

describe('formatCalendarDay', () => {
  it('writes the UTC calendar date of an instant', () => {
    // ECMA-262 Date.UTC and toISOString: the first 10 characters are the UTC date.
    expect(formatCalendarDay(new Date(Date.UTC(2026, 11, 31, 23, 59)))).toBe('2026-12-31');
    expect(formatCalendarDay(new Date('2027-01-01T00:00:00Z'))).toBe('2027-01-01');
  });

  it('is the inverse of parseCalendarDay', () => {
    // Property: agrees with ECMA-262 toISOString().slice(0, 10) for any day of years 1000–9999.
    expectProperty(
      fc.property(fc.date({ min: new Date('1000-01-01T00:00:00Z'), max: new Date('9999-12-31T00:00:00Z'), noInvalidDate: true }), (date) => {
        const day = date.toISOString().slice(0, 10);
        expect(formatCalendarDay(parseCalendarDay(day))).toBe(day);
        expect(formatCalendarDay(date)).toBe(day);
      }),
    );
  });
});
