import { IsoWeekDate } from './iso-week';
import { isoWeekOf } from './iso-week-of';
import { localDay } from './local-day';

/**
 * The ISO 8601 week date of an instant on the reader's own calendar: the same instant can be
 * Sunday of one week in one zone and Monday of the next in another.
 *
 * @throws RangeError for a timestamp without an offset or an unknown time zone.
 * @example
 * isoWeekAt('2026-01-04T23:30:00Z', 'UTC') // { year: 2026, week: 1, weekday: 7 }
 * isoWeekAt('2026-01-04T23:30:00Z', 'Asia/Tokyo') // { year: 2026, week: 2, weekday: 1 }
 */
export function isoWeekAt(timestamp: string, timeZone: string): IsoWeekDate {
  return isoWeekOf(localDay(timestamp, timeZone));
}
