import { TZDate, tz } from '@date-fns/tz';
import { isValid, parse } from 'date-fns';

// date-fns `parse` alone accepts '2026-2-3'; the pattern keeps stored dates in one shape.
const CALENDAR_DAY = /^\d{4}-\d{2}-\d{2}$/;

/**
 * Turns a calendar date ('YYYY-MM-DD') into midnight of that day in UTC, as a `TZDate` pinned to
 * UTC, so date-fns arithmetic on it never depends on the machine's time zone.
 *
 * @throws RangeError when the text is not a real date in that shape (e.g. '2026-02-30').
 * @example
 * parseCalendarDay('2026-07-01').getTime() === Date.UTC(2026, 6, 1) // true
 */
export function parseCalendarDay(day: string): TZDate {
  const date = CALENDAR_DAY.test(day) ? parse(day, 'yyyy-MM-dd', new Date(0), { in: tz('UTC') }) : null;
  if (date === null || !isValid(date)) throw new RangeError(`Not a calendar date (YYYY-MM-DD): ${day}`);
  return date;
}
