import { formatIsoWeek } from './format-iso-week';
import { isoWeekOf } from './iso-week-of';

describe('formatIsoWeek', () => {
  it('writes the extended form YYYY-Www-D', () => {
    // Wikipedia, "ISO week date": 29 December 2008 is written 2009-W01-1, 3 January 2010 is
    // 2009-W53-7, and 31 December 2006 is 2006-W52-7.
    expect(formatIsoWeek(isoWeekOf('2008-12-29'))).toBe('2009-W01-1');
    expect(formatIsoWeek(isoWeekOf('2010-01-03'))).toBe('2009-W53-7');
    expect(formatIsoWeek(isoWeekOf('2006-12-31'))).toBe('2006-W52-7');
  });

  it('writes a week without a weekday as YYYY-Www', () => {
    // ISO 8601-1:2019 §5.2.4.1 (from memory): the week, reduced precision, is YYYY-Www; also the
    // value format of HTML <input type=week> (WHATWG HTML, "valid week string": 2026-W05).
    expect(formatIsoWeek({ year: 2026, week: 5 })).toBe('2026-W05');
  });

  it('refuses parts out of range', () => {
    // ISO 8601: weeks 01–53, weekdays 1 (Monday) to 7 (Sunday).
    expect(() => formatIsoWeek({ year: 2026, week: 54 })).toThrowError(RangeError);
    expect(() => formatIsoWeek({ year: 2026, week: 0 })).toThrowError(RangeError);
    expect(() => formatIsoWeek({ year: 2026, week: 1, weekday: 8 })).toThrowError(RangeError);
    expect(() => formatIsoWeek({ year: 12026, week: 1 })).toThrowError(RangeError);
  });
});
