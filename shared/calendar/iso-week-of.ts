import { tz } from '@date-fns/tz';
import { getISODay, getISOWeek, getISOWeekYear } from 'date-fns';
import { IsoWeekDate } from './iso-week';
import { parseCalendarDay } from './parse-calendar-day';

/**
 * The ISO 8601 week date of a calendar date. The week-numbering year can differ from the
 * calendar year in the first and last days of January and December.
 *
 * @throws RangeError when `day` is not a 'YYYY-MM-DD' date.
 * @example
 * isoWeekOf('2008-12-29') // { year: 2009, week: 1, weekday: 1 }
 * isoWeekOf('2010-01-03') // { year: 2009, week: 53, weekday: 7 }
 */
export function isoWeekOf(day: string): IsoWeekDate {
  const date = parseCalendarDay(day);
  const inUtc = { in: tz('UTC') };
  return { year: getISOWeekYear(date, inUtc), week: getISOWeek(date, inUtc), weekday: getISODay(date, inUtc) };
}
