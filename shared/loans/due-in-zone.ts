import { localDay } from '../calendar/local-day';
import { daysFrom } from './loan-state';

/**
 * Days until a due date for a reader at instant `now` in their IANA zone. A book due on the 5th
 * is due on the 5th where the reader lives: the day is the reader's local day, never UTC's.
 *
 * @example
 * // 2026-03-05T05:00Z is still 4 March in Los Angeles (UTC−8), and already 5 March in Kiritimati (UTC+14).
 * daysUntilDue('2026-03-05', '2026-03-05T05:00:00Z', 'America/Los_Angeles') // 1
 * daysUntilDue('2026-03-05', '2026-03-05T05:00:00Z', 'Pacific/Kiritimati')  // 0
 */
export function daysUntilDue(dueOn: string, now: string, timeZone: string): number {
  return daysFrom(localDay(now, timeZone), dueOn);
}

/** "due today", "due tomorrow", "due in 4 days", "1 day overdue", "3 days overdue". */
export function dueText(days: number, word = 'due'): string {
  if (days === 0) return `${word} today`;
  if (days === 1) return `${word} tomorrow`;
  if (days > 1) return `${word} in ${days} days`;
  return `${-days} ${days === -1 ? 'day' : 'days'} overdue`;
}
