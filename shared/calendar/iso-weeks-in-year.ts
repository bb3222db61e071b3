import { tz } from '@date-fns/tz';
import { getISOWeeksInYear } from 'date-fns';
import { parseCalendarDay } from './parse-calendar-day';

/**
 * How many ISO 8601 weeks the week-numbering year has: 52, or 53 in a "long" year.
 *
 * @throws RangeError for a year that is not an integer from 1 to 9999.
 * @example
 * isoWeeksInYear(2026) // 53
 * isoWeeksInYear(2027) // 52
 */
export function isoWeeksInYear(year: number): number {
  if (!Number.isInteger(year) || year < 1 || year > 9999) throw new RangeError(`Year out of range: ${year}`);
  // 4 January always lies in week 1 of its own year, so it names the week-numbering year.
  // Parsed from text: the Date constructor would read years 0–99 as 1900–1999.
  return getISOWeeksInYear(parseCalendarDay(`${String(year).padStart(4, '0')}-01-04`), { in: tz('UTC') });
}
