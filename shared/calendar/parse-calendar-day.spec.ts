import { parseCalendarDay } from './parse-calendar-day';

describe('parseCalendarDay', () => {
  it('reads a date as midnight UTC, whatever the machine zone', () => {
    // ECMA-262 Date.UTC: the time value of that midnight in UTC (month 6 is July).
    expect(parseCalendarDay('2026-07-01').getTime()).toBe(Date.UTC(2026, 6, 1));
  });

  it('follows the Gregorian leap-year rule', () => {
    // RFC 3339 Appendix C: leap if divisible by 4, except centuries not divisible by 400.
    expect(parseCalendarDay('2024-02-29').getTime()).toBe(Date.UTC(2024, 1, 29));
    expect(parseCalendarDay('2000-02-29').getTime()).toBe(Date.UTC(2000, 1, 29));
    expect(() => parseCalendarDay('2025-02-29')).toThrowError(RangeError);
    expect(() => parseCalendarDay('1900-02-29')).toThrowError(RangeError);
  });

  it('rejects days that do not exist and other shapes', () => {
    // RFC 3339 §5.6 full-date: 4-digit year, 2-digit month, 2-digit day; day ≤ days in month.
    for (const text of ['2026-02-30', '2026-04-31', '2026-13-01', '2026-2-3', '20260203', '2026-02-03T00:00', '']) {
      expect(() => parseCalendarDay(text))
        .withContext(text)
        .toThrowError(RangeError);
    }
  });
});
