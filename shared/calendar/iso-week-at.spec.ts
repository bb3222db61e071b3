import { isoWeekAt } from './iso-week-at';

describe('isoWeekAt', () => {
  // Local times from the IANA tz database (Tokyo UTC+9; Los Angeles UTC−8 in January, UTC−7
  // after 2026-03-08); ISO weeks checked with Python's zoneinfo + isocalendar() while writing.
  const sundayNight = '2026-01-04T23:30:00Z';

  it('is Sunday of 2026-W01 in UTC', () => {
    expect(isoWeekAt(sundayNight, 'UTC')).toEqual({ year: 2026, week: 1, weekday: 7 });
  });

  it('is still Sunday of 2026-W01 in America/Los_Angeles (15:30 local)', () => {
    expect(isoWeekAt(sundayNight, 'America/Los_Angeles')).toEqual({ year: 2026, week: 1, weekday: 7 });
  });

  it('is already Monday of 2026-W02 in Asia/Tokyo (08:30 local)', () => {
    expect(isoWeekAt(sundayNight, 'Asia/Tokyo')).toEqual({ year: 2026, week: 2, weekday: 1 });
  });

  it('crosses the ISO-year boundary by zone', () => {
    // 2027-01-03T20:00Z: Sunday 2026-W53-7 in UTC and Los Angeles (12:00), Monday 4 January
    // (2027-W01-1) in Tokyo (05:00). 2026 has 53 weeks (WHATWG HTML week rule).
    expect(isoWeekAt('2027-01-03T20:00:00Z', 'UTC')).toEqual({ year: 2026, week: 53, weekday: 7 });
    expect(isoWeekAt('2027-01-03T20:00:00Z', 'America/Los_Angeles')).toEqual({ year: 2026, week: 53, weekday: 7 });
    expect(isoWeekAt('2027-01-03T20:00:00Z', 'Asia/Tokyo')).toEqual({ year: 2027, week: 1, weekday: 1 });
  });
});
