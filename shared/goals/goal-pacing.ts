import { tz } from '@date-fns/tz';
import { differenceInCalendarDays, getDaysInYear } from 'date-fns';
import { parseCalendarDay } from '../calendar/parse-calendar-day';

/** A yearly target for one unit, and where the reader stands on `today` (their local date). */
export interface GoalPacingInput {
  /** Amount aimed for in the year (books, pages or minutes); more than 0. */
  readonly target: number;
  /** Amount done so far this year, today included; 0 or more. */
  readonly actual: number;
  readonly year: number;
  /** The reader's local date, 'YYYY-MM-DD'. */
  readonly today: string;
  /** The reader's recent pace per day (e.g. the last 28 days); used for the forecast. */
  readonly recentRatePerDay?: number;
}

export type PacingStatus = 'ahead' | 'on-track' | 'behind';

export interface GoalPacing {
  readonly target: number;
  /** Where an even pace through the year would be at the start of `today`. */
  readonly expectedByToday: number;
  readonly actual: number;
  /** actual − expectedByToday: positive when ahead. */
  readonly difference: number;
  readonly status: PacingStatus;
  /** What is left, spread over the weeks left (today included); null once the year is over. */
  readonly neededPerWeek: number | null;
  /** Where the recent (or else year-to-date) pace ends the year; null when there is no pace yet. */
  readonly forecastYearEnd: number | null;
  /** Whole days of the year gone before `today` (0 on 1 January). */
  readonly daysElapsed: number;
  readonly daysInYear: number;
}

/**
 * How a yearly goal is going against an even pace.
 *
 * Expected by today counts the whole days gone before `today`: 52 books at the start of 1 July
 * of a non-leap year is 52 × 181 / 365 ≈ 25.8. `today` before the year counts as day 0, after
 * it as the full year.
 *
 * "On track" is a product decision: within one week's worth of an even pace (target × 7 / days
 * in the year, about 2 % of the target), but never tighter than half a unit. A week is the
 * smallest slip a reader can feel and make up; the half-unit floor keeps a 12-book goal from
 * flipping to "behind" over part of one book.
 *
 * @throws RangeError for a target ≤ 0, a negative amount or rate, or a bad date.
 * @example
 * goalPacing({ target: 52, actual: 29, year: 2026, today: '2026-07-01' })
 * // { expectedByToday: 25.79…, difference: 3.21…, status: 'ahead', neededPerWeek: 0.87…,
 * //   forecastYearEnd: 58.48…, daysElapsed: 181, daysInYear: 365, target: 52, actual: 29 }
 */
export function goalPacing(input: GoalPacingInput): GoalPacing {
  const { target, actual, year, today, recentRatePerDay } = input;
  if (!(Number.isFinite(target) && target > 0)) throw new RangeError(`Target must be more than 0: ${target}`);
  if (!(Number.isFinite(actual) && actual >= 0)) throw new RangeError(`Amount must be 0 or more: ${actual}`);
  if (recentRatePerDay !== undefined && !(Number.isFinite(recentRatePerDay) && recentRatePerDay >= 0)) {
    throw new RangeError(`Rate must be 0 or more: ${recentRatePerDay}`);
  }
  if (!Number.isInteger(year) || year < 1 || year > 9999) throw new RangeError(`Year out of range: ${year}`);

  const inUtc = { in: tz('UTC') };
  const jan1 = parseCalendarDay(`${String(year).padStart(4, '0')}-01-01`);
  const daysInYear = getDaysInYear(jan1, inUtc);
  const gone = differenceInCalendarDays(parseCalendarDay(today), jan1, inUtc);
  const daysElapsed = Math.min(Math.max(gone, 0), daysInYear);
  const daysLeft = daysInYear - daysElapsed;

  // The share of the year first, so the last day gives exactly the target (no rounding past it).
  const expectedByToday = target * (daysElapsed / daysInYear);
  const difference = actual - expectedByToday;
  const tolerance = Math.max((target * 7) / daysInYear, 0.5);
  const status: PacingStatus = difference > tolerance ? 'ahead' : difference < -tolerance ? 'behind' : 'on-track';

  const remaining = Math.max(target - actual, 0);
  const neededPerWeek = daysLeft === 0 ? null : remaining / (daysLeft / 7);
  // Without a recent pace, fall back to the year-to-date average; on day 0 there is none.
  const rate = recentRatePerDay ?? (daysElapsed > 0 ? actual / daysElapsed : null);
  const forecastYearEnd = rate === null ? null : actual + rate * daysLeft;

  return { target, expectedByToday, actual, difference, status, neededPerWeek, forecastYearEnd, daysElapsed, daysInYear };
}
