import { assertTimeZone } from '../calendar/assert-time-zone';
import { dayFromIndex } from '../reading-log/day-from-index';
import { dayIndex } from '../reading-log/day-index';
import { minutesToCover } from './minutes-to-cover';
import { Pace } from './pace';

/** What `forecastFinish` needs. */
export interface ForecastInput {
  /** What is left, in the pace's unit: pages, percent, or listened minutes. */
  readonly remaining: number;
  readonly pace: Pace;
  /** Usual reading minutes per calendar day, e.g. from `usualMinutesPerDay`. */
  readonly minutesPerDay: number;
  /** The reader's local day, 'YYYY-MM-DD'. */
  readonly today: string;
  /** The reader's IANA time zone, the one `today` was taken in. */
  readonly timeZone: string;
}

/** When the reader should finish. */
export interface Forecast {
  /** Real minutes of reading left. */
  readonly minutesLeft: number;
  /** Reading days needed, today included; null when the reader has no usual minutes. */
  readonly daysLeft: number | null;
  /** The local day the book should be finished; null when it cannot be foreseen. */
  readonly finishDate: string | null;
}

/**
 * When the reader should finish at their pace and usual minutes a day. Today counts as the
 * first reading day, so a book needing one day's reading finishes today. Days are whole: part
 * of a day still takes that day.
 *
 * `today` is already the reader's local day; adding whole days to a calendar date is the same
 * in every zone, so `timeZone` is only checked here, to catch a caller that lost it.
 *
 * @example
 * // 300 pages at 30 pages/hour = 600 minutes; at 45 minutes a day 13.3 → 14 days, today included.
 * forecastFinish({ remaining: 300, pace: { format: 'print', rate: 30 }, minutesPerDay: 45,
 *                  today: '2026-03-01', timeZone: 'America/Los_Angeles' })
 * // { minutesLeft: 600, daysLeft: 14, finishDate: '2026-03-14' }
 */
export function forecastFinish(input: ForecastInput): Forecast {
  assertTimeZone(input.timeZone);
  const todayIndex = dayIndex(input.today);
  const minutesLeft = minutesToCover(input.remaining, input.pace);
  if (minutesLeft === 0) return { minutesLeft, daysLeft: 0, finishDate: input.today };
  if (!(input.minutesPerDay > 0)) return { minutesLeft, daysLeft: null, finishDate: null };

  // The small allowance keeps 600 / (600 / 14) from rounding up to 15 through float error;
  // any reading left still takes today.
  const daysLeft = Math.max(1, Math.ceil(minutesLeft / input.minutesPerDay - 1e-9));
  return { minutesLeft, daysLeft, finishDate: dayFromIndex(todayIndex + daysLeft - 1) };
}
