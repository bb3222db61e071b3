import { tz } from '@date-fns/tz';
import { addDays, addWeeks, startOfISOWeekYear } from 'date-fns';
import { formatCalendarDay } from './format-calendar-day';
import { IsoWeekSpan } from './iso-week';
import { isoWeeksInYear } from './iso-weeks-in-year';
import { parseCalendarDay } from './parse-calendar-day';

/**
 * Every ISO 8601 week of a week-numbering year, in order, with its Monday and Sunday. Week 1 can
 * start in the previous December and the last week can end in the next January.
 *
 * @throws RangeError for a year that is not an integer from 1 to 9999.
 * @example
 * isoWeeksOfYear(2026)[0] // { year: 2026, week: 1, monday: '2025-12-29', sunday: '2026-01-04' }
 * isoWeeksOfYear(2026).length // 53
 */
export function isoWeeksOfYear(year: number): IsoWeekSpan[] {
  const count = isoWeeksInYear(year);
  const inUtc = { in: tz('UTC') };
  // isoWeeksInYear has checked the year, so the padded text is a real date.
  const firstMonday = startOfISOWeekYear(parseCalendarDay(`${String(year).padStart(4, '0')}-01-04`), inUtc);
  return Array.from({ length: count }, (_, index) => {
    const monday = addWeeks(firstMonday, index, inUtc);
    return { year, week: index + 1, monday: formatCalendarDay(monday), sunday: formatCalendarDay(addDays(monday, 6, inUtc)) };
  });
}
