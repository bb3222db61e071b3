import { localDay } from './local-day';

describe('localDay', () => {
  it('gives the calendar day in the reader’s zone, not the machine’s', () => {
    // IANA tz database: Los Angeles is UTC−8 (PST) until 8 March 2026 02:00, Tokyo is UTC+9 all year.
    expect(localDay('2026-03-08T07:30:00.000Z', 'UTC')).toBe('2026-03-08');
    expect(localDay('2026-03-08T07:30:00.000Z', 'America/Los_Angeles')).toBe('2026-03-07'); // 23:30 PST
    expect(localDay('2026-03-07T15:30:00.000Z', 'Asia/Tokyo')).toBe('2026-03-08'); // 00:30 JST
  });

  it('accepts epoch milliseconds', () => {
    // 2026-03-08T07:59:59.999Z is 23:59:59.999 PST, the last instant of 7 March in Los Angeles.
    expect(localDay(Date.parse('2026-03-08T07:59:59.999Z'), 'America/Los_Angeles')).toBe('2026-03-07');
    expect(localDay(Date.parse('2026-03-08T08:00:00.000Z'), 'America/Los_Angeles')).toBe('2026-03-08');
  });

  it('throws on a bad timestamp or zone', () => {
    expect(() => localDay('yesterday', 'UTC')).toThrowError(RangeError);
    expect(() => localDay('2026-03-08T07:30:00.000Z', 'Nowhere/Land')).toThrowError(RangeError);
  });
});
