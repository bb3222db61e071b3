import { tz } from '@date-fns/tz';
import { format } from 'date-fns';

/**
 * The calendar date ('YYYY-MM-DD') of an instant as seen in UTC: the inverse of
 * `parseCalendarDay`, whose dates sit at UTC midnight.
 *
 * @example
 * formatCalendarDay(parseCalendarDay('2026-12-31')) // '2026-12-31'
 */
export function formatCalendarDay(date: Date): string {
  return format(date, 'yyyy-MM-dd', { in: tz('UTC') });
}
