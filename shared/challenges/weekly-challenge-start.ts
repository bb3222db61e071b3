import { isoWeeksOfYear } from '../calendar/iso-weeks-of-year';
import { parseCalendarDay } from '../calendar/parse-calendar-day';

/** Which weeks a new book-a-week challenge counts: from the week it is made, or all of its year. */
export type WeeklyChallengeFrom = 'this-week' | 'whole-year';

/**
 * The Monday a new weekly challenge counts from. "This week" is the ISO week holding `today`
 * when it falls in the challenge's week-numbering year; a challenge for a later year starts at
 * its week 1, one for a past year at its last week.
 *
 * @example
 * weeklyChallengeStart({ year: 2026, today: '2026-12-04', from: 'this-week' }) // '2026-11-30'
 * weeklyChallengeStart({ year: 2026, today: '2026-12-04', from: 'whole-year' }) // '2025-12-29'
 */
export function weeklyChallengeStart(input: { readonly year: number; readonly today: string; readonly from: WeeklyChallengeFrom }): string {
  parseCalendarDay(input.today);
  const weeks = isoWeeksOfYear(input.year);
  if (input.from === 'whole-year') return weeks[0].monday;
  // Same-shaped ISO 8601 dates sort as text in time order (RFC 3339 §5.1).
  const started = weeks.filter((week) => week.monday <= input.today);
  return (started[started.length - 1] ?? weeks[0]).monday;
}
