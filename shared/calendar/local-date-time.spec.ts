import { instantFromLocalDateTime, localDateTime } from './local-date-time';

describe('localDateTime and instantFromLocalDateTime', () => {
  // Offsets from the IANA tz database: Los Angeles is UTC−8 (PST) until 2026-03-08 02:00, then
  // UTC−7 (PDT) until 2026-11-01 02:00; Tokyo is UTC+9 all year.
  const sameMoments = [
    { instant: '2026-03-08T07:30:00.000Z', zone: 'America/Los_Angeles', wall: '2026-03-07T23:30' }, // PST
    { instant: '2026-03-08T07:30:00.000Z', zone: 'Asia/Tokyo', wall: '2026-03-08T16:30' },
    { instant: '2026-07-01T19:05:00.000Z', zone: 'America/Los_Angeles', wall: '2026-07-01T12:05' }, // PDT
  ];
  for (const { instant, zone, wall } of sameMoments) {
    it(`shows ${instant} as ${wall} on the wall clock of ${zone}, and reads that back as the same instant`, () => {
      expect(localDateTime(instant, zone)).toBe(wall);
      expect(instantFromLocalDateTime(wall, zone)).toBe(instant);
    });
  }

  it('shows a wall time to the minute, from an instant with or without milliseconds, and reads seconds when given', () => {
    expect(localDateTime('2026-07-01T19:05:59.999Z', 'America/Los_Angeles')).toBe('2026-07-01T12:05');
    expect(localDateTime('2026-03-08T07:30:00Z', 'Asia/Tokyo')).toBe('2026-03-08T16:30');
    expect(instantFromLocalDateTime('2026-07-01T12:05:30', 'America/Los_Angeles')).toBe('2026-07-01T19:05:30.000Z');
  });

  it('moves a time skipped by DST forward, and takes the first of a time that happens twice', () => {
    // Temporal proposal, ToTemporalZonedDateTime disambiguation "compatible": later for gaps,
    // earlier for overlaps. 02:30 does not exist on 8 March 2026 in Los Angeles; 01:30 happens
    // twice on 1 November 2026 (PDT, then PST).
    expect(instantFromLocalDateTime('2026-03-08T02:30', 'America/Los_Angeles')).toBe('2026-03-08T10:30:00.000Z');
    expect(instantFromLocalDateTime('2026-11-01T01:30', 'America/Los_Angeles')).toBe('2026-11-01T08:30:00.000Z');
  });

  it('round-trips every minute of a DST day that exists', () => {
    // Property over 2026-11-01 in Los Angeles, a 25-hour day: each instant shows as a wall time
    // that reads back as the same instant, except the repeated hour, which reads as its first.
    for (let ms = Date.parse('2026-11-01T07:00:00Z'); ms < Date.parse('2026-11-02T08:00:00Z'); ms += 15 * 60_000) {
      const wall = localDateTime(new Date(ms).toISOString(), 'America/Los_Angeles');
      const back = Date.parse(instantFromLocalDateTime(wall, 'America/Los_Angeles')!);
      const repeated = ms >= Date.parse('2026-11-01T09:00:00Z') && ms < Date.parse('2026-11-01T10:00:00Z');
      expect(back).toBe(repeated ? ms - 3600_000 : ms);
    }
  });

  it('refuses text that is not a date and time, and impossible dates', () => {
    expect(instantFromLocalDateTime('', 'UTC')).toBeNull();
    expect(instantFromLocalDateTime('2026-03-08', 'UTC')).toBeNull();
    expect(instantFromLocalDateTime('2026-04-31T10:00', 'UTC')).toBeNull(); // April has 30 days
    expect(instantFromLocalDateTime('2026-02-29T10:00', 'UTC')).toBeNull(); // 2026 is not a leap year
    expect(instantFromLocalDateTime('2026-03-08T24:00', 'UTC')).toBeNull();
    expect(() => instantFromLocalDateTime('2026-03-08T10:00', 'Mars/Olympus_Mons')).toThrowError(RangeError);
  });
});
