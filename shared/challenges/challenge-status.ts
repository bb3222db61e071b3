import { parseCalendarDay } from '../calendar/parse-calendar-day';
import { ChallengePeriod, ChallengeStatus } from './challenge-book';

/**
 * The common shape every challenge reports: its period, done against target, the books that
 * counted and whether it is finished (done reached a target above 0).
 *
 * @throws RangeError for a period that ends before it starts, a bad date, or a negative or
 *   fractional done or target.
 * @example
 * challengeStatus({ period: { start: '2026-01-01', end: '2026-12-31' }, done: 25, target: 25, counted: ['b1'] }).finished
 * // true
 */
export function challengeStatus(input: {
  readonly period: ChallengePeriod;
  readonly done: number;
  readonly target: number;
  readonly counted: readonly string[];
}): ChallengeStatus {
  const { period, done, target, counted } = input;
  // Same-shaped ISO 8601 dates sort as text in time order (RFC 3339 §5.1).
  parseCalendarDay(period.start);
  parseCalendarDay(period.end);
  if (period.end < period.start) throw new RangeError(`Period ends before it starts: ${period.start} – ${period.end}`);
  for (const [name, value] of [
    ['done', done],
    ['target', target],
  ] as const) {
    if (!Number.isInteger(value) || value < 0) throw new RangeError(`${name} must be a whole number, 0 or more: ${value}`);
  }
  return { period: { start: period.start, end: period.end }, done, target, counted: [...counted], finished: target > 0 && done >= target };
}
