import fc from 'fast-check';
import { localDay } from './local-day';
import { expectProperty } from '../testing/expect-property';

describe('localDay', () => {
  // Offsets from the IANA tz database: Asia/Tokyo is UTC+9 all year (no DST);
  // America/Los_Angeles is UTC−8 (PST) in winter and UTC−7 (PDT) from 2026-03-08 02:00 local
  // (US rule: second Sunday in March, Energy Policy Act of 2005). Values also checked with
  // Python's zoneinfo while writing this spec.
  const cases: [timestamp: string, zone: string, day: string][] = [
    ['2026-01-04T23:30:00Z', 'UTC', '2026-01-04'],
    ['2026-01-04T23:30:00Z', 'America/Los_Angeles', '2026-01-04'],
    ['2026-01-04T23:30:00Z', 'Asia/Tokyo', '2026-01-05'],
    ['2026-01-05T07:59:00Z', 'America/Los_Angeles', '2026-01-04'],
    ['2026-01-05T08:00:00Z', 'America/Los_Angeles', '2026-01-05'],
    ['2026-01-04T14:59:59Z', 'Asia/Tokyo', '2026-01-04'],
    ['2026-01-04T15:00:00Z', 'Asia/Tokyo', '2026-01-05'],
  ];
  for (const [timestamp, zone, day] of cases) {
    it(`reads ${timestamp} as ${day} in ${zone}`, () => {
      expect(localDay(timestamp, zone)).toBe(day);
    });
  }

  it('uses the offset in force on that day (daylight saving time)', () => {
    // Same UTC clock time, one week apart: 23:30 PST on Sunday 1 March, 00:30 PDT on Monday 9 March.
    expect(localDay('2026-03-02T07:30:00Z', 'America/Los_Angeles')).toBe('2026-03-01');
    expect(localDay('2026-03-09T07:30:00Z', 'America/Los_Angeles')).toBe('2026-03-09');
  });

  it('puts the last millisecond before local midnight on the earlier day', () => {
    // 2026-03-08T07:59:59.999Z is 23:59:59.999 PST, the last instant of 7 March in Los Angeles.
    expect(localDay('2026-03-08T07:59:59.999Z', 'America/Los_Angeles')).toBe('2026-03-07');
    expect(localDay('2026-03-08T08:00:00.000Z', 'America/Los_Angeles')).toBe('2026-03-08');
  });

  it('honours an explicit offset in the timestamp', () => {
    // RFC 3339 §5.6: time-offset = "Z" / ("+" / "-") HH:MM; 2026-01-05T08:30+09:00 is 2026-01-04T23:30Z.
    expect(localDay('2026-01-05T08:30:00+09:00', 'UTC')).toBe('2026-01-04');
  });

  it('in UTC is the date part of a Z timestamp', () => {
    // ECMA-262 Date.prototype.toISOString always writes UTC with a trailing Z.
    expectProperty(
      fc.property(fc.date({ min: new Date('1970-01-01T00:00:00Z'), max: new Date('2100-12-31T23:59:59Z'), noInvalidDate: true }), (date) => {
        const timestamp = date.toISOString();
        expect(localDay(timestamp, 'UTC')).toBe(timestamp.slice(0, 10));
      }),
    );
  });

  it('refuses a timestamp with no offset, which would mean the machine zone', () => {
    // RFC 3339 §5.6 date-time requires time-offset; without it the instant is ambiguous.
    expect(() => localDay('2026-01-04T23:30:00', 'UTC')).toThrowError(RangeError);
    expect(() => localDay('2026-01-04', 'UTC')).toThrowError(RangeError);
    expect(() => localDay('yesterday', 'UTC')).toThrowError(RangeError);
  });

  it('refuses an unknown time zone', () => {
    // ECMA-402 IsValidTimeZoneName: names outside the IANA database throw a RangeError.
    expect(() => localDay('2026-01-04T23:30:00Z', 'Mars/Olympus_Mons')).toThrowError(RangeError);
  });
});
