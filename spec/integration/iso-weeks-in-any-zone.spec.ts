import { isoWeekAt } from '../../shared/calendar/iso-week-at';
import { isoWeekOf } from '../../shared/calendar/iso-week-of';
import { isoWeeksInYear } from '../../shared/calendar/iso-weeks-in-year';

/**
 * The ISO 8601 week computations must not depend on the zone of the machine they run on (a
 * reader's phone set to Kiritimati, a server in UTC). Node reads `process.env.TZ` afresh when it
 * changes, so this spec runs the published examples under several process zones.
 */
describe('ISO 8601 weeks, whatever the machine’s time zone', () => {
  const before = process.env['TZ'];
  afterAll(() => {
    if (before === undefined) delete process.env['TZ'];
    else process.env['TZ'] = before;
  });

  // Offsets from the IANA tz database, January: UTC+14, UTC−11, UTC−3:30, UTC+5:45, UTC+0.
  const zones = [
    { zone: 'Pacific/Kiritimati', januaryOffsetMinutes: -840 },
    { zone: 'Pacific/Pago_Pago', januaryOffsetMinutes: 660 },
    { zone: 'America/St_Johns', januaryOffsetMinutes: 210 },
    { zone: 'Asia/Kathmandu', januaryOffsetMinutes: -345 },
    { zone: 'UTC', januaryOffsetMinutes: 0 },
  ];

  for (const { zone, januaryOffsetMinutes } of zones) {
    it(`gives the published weeks with the process in ${zone}`, () => {
      process.env['TZ'] = zone;
      // The zone really is in force (getTimezoneOffset is minutes behind UTC).
      expect(new Date(2026, 0, 15).getTimezoneOffset()).toBe(januaryOffsetMinutes);

      // Python documentation (date.isocalendar) and the ISO week date examples.
      expect(isoWeekOf('2008-12-29')).toEqual({ year: 2009, week: 1, weekday: 1 });
      expect(isoWeekOf('2010-01-03')).toEqual({ year: 2009, week: 53, weekday: 7 });
      // PostgreSQL documentation, EXTRACT(week): 2004-12-31 and 2005-01-01 are in 2004-W53.
      expect(isoWeekOf('2004-12-31')).toEqual(jasmine.objectContaining({ year: 2004, week: 53 }));
      expect(isoWeekOf('2005-01-01')).toEqual(jasmine.objectContaining({ year: 2004, week: 53 }));
      // WHATWG HTML, "week-number-of-the-last-day": the years with 53 weeks from 2000 to 2040.
      const long = Array.from({ length: 41 }, (_, i) => 2000 + i).filter((year) => isoWeeksInYear(year) === 53);
      expect(long).toEqual([2004, 2009, 2015, 2020, 2026, 2032, 2037]);
      // An instant is placed by the reader's zone, not the machine's: 2026-01-01T02:00Z is still
      // Wednesday 31 December 2025 in Los Angeles (UTC−8), 2026-W01-3.
      expect(isoWeekAt('2026-01-01T02:00:00Z', 'America/Los_Angeles')).toEqual(jasmine.objectContaining({ year: 2026, week: 1, weekday: 3 }));
    });
  }
});
