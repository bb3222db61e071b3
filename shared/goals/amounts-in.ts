import { booksFinishedIn } from '../challenges/books-finished-in';
import { ChallengeBook, ChallengePeriod } from '../challenges/challenge-book';
import { dailyLog } from '../reading-log/daily-log';
import { dayFromIndex } from '../reading-log/day-from-index';
import { dayIndex } from '../reading-log/day-index';
import { DailyLogEntry, LogSession } from '../reading-log/log-session';
import { GoalUnit } from './goal-unit';

/** Books finished, pages read and minutes spent, in some period. */
export type Amounts = Readonly<Record<GoalUnit, number>>;

/** What `sessionLog` reads of a session row (a `sessions` row fits). */
export interface GoalSessionRow {
  readonly format?: string | null;
  readonly startedAt?: string | null;
  readonly endedAt?: string | null;
  readonly activeMinutes?: number | null;
  readonly fromPosition?: number | null;
  readonly toPosition?: number | null;
  readonly deleted?: boolean | null;
}

/**
 * The reader's sessions as a daily log (minutes and pages per local day, via `dailyLog`).
 *
 * Pages come from print sessions only, as `toPosition − fromPosition` (an ebook's positions are
 * percents and an audiobook's are minutes, so they are no pages); a session read backwards
 * counts no pages. Minutes are `activeMinutes`. A session without `endedAt` counts wholly on the
 * day it started; one without `startedAt`, or deleted, is left out.
 *
 * @example
 * sessionLog([{ format: 'print', startedAt: '2026-05-04T18:00:00Z', endedAt: '2026-05-04T18:45:00Z',
 *               activeMinutes: 40, fromPosition: 100, toPosition: 112 }], 'UTC')
 * // [{ day: '2026-05-04', minutes: 40, pages: 12 }]
 */
export function sessionLog(sessions: readonly GoalSessionRow[], timeZone: string): DailyLogEntry[] {
  const logged: LogSession[] = [];
  for (const session of sessions) {
    if (session.deleted || !session.startedAt) continue;
    const { fromPosition, toPosition } = session;
    const pages = session.format === 'print' && fromPosition != null && toPosition != null ? Math.max(0, toPosition - fromPosition) : undefined;
    logged.push({
      startedAt: session.startedAt,
      endedAt: session.endedAt ?? session.startedAt,
      activeMinutes: session.activeMinutes ?? 0,
      pages,
    });
  }
  return dailyLog(logged, timeZone);
}

/**
 * Books finished (by `finishedOn`), pages and minutes (by local day) in a period, both ends
 * included, from a daily log made once (see `sessionLog`).
 *
 * @example
 * amountsInLog({ start: '2026-05-01', end: '2026-05-31' }, finished, log) // { books: 2, pages: 310, minutes: 545 }
 */
export function amountsInLog(period: ChallengePeriod, finished: readonly ChallengeBook[], log: readonly DailyLogEntry[]): Amounts {
  let pages = 0;
  let minutes = 0;
  for (const entry of log) {
    // Same-shaped ISO 8601 dates sort as text in time order (RFC 3339 §5.1).
    if (entry.day < period.start || entry.day > period.end) continue;
    pages += entry.pages;
    minutes += entry.minutes;
  }
  return { books: booksFinishedIn(finished, period).length, pages, minutes };
}

/**
 * Books finished, pages read and minutes spent in a period (both ends included), on the reader's
 * local days in `timeZone`. Pages and minutes may be fractional where a session crosses
 * midnight into or out of the period (see `dailyLog`).
 *
 * @param finished from `finishedBooks`.
 * @example
 * amountsIn({ start: '2026-01-01', end: '2026-12-31' }, finished, sessions, 'Europe/Lisbon')
 * // { books: 14, pages: 3820, minutes: 6105 }
 */
export function amountsIn(period: ChallengePeriod, finished: readonly ChallengeBook[], sessions: readonly GoalSessionRow[], timeZone: string): Amounts {
  return amountsInLog(period, finished, sessionLog(sessions, timeZone));
}

/** How many days the recent pace looks back over: four weeks, so weekdays and weekends both count. */
export const RECENT_DAYS = 28;

/**
 * The reader's recent pace per day for each unit: what they did in the `days` days ending
 * `today` (today included), divided by `days`.
 *
 * @example
 * recentRatesPerDay('2026-07-01', finished, log) // { books: 0.071…, pages: 21.4…, minutes: 35.7… }
 */
export function recentRatesPerDay(today: string, finished: readonly ChallengeBook[], log: readonly DailyLogEntry[], days = RECENT_DAYS): Amounts {
  if (!Number.isInteger(days) || days < 1) throw new RangeError(`Days must be a whole number from 1: ${days}`);
  const period = { start: dayFromIndex(dayIndex(today) - (days - 1)), end: today };
  const amounts = amountsInLog(period, finished, log);
  return { books: amounts.books / days, pages: amounts.pages / days, minutes: amounts.minutes / days };
}

/**
 * The amounts of each month of `year`, January first (twelve entries).
 *
 * @example
 * monthlyAmounts(2026, finished, log)[2] // March: { books: 3, pages: 812, minutes: 1130 }
 */
export function monthlyAmounts(year: number, finished: readonly ChallengeBook[], log: readonly DailyLogEntry[]): Amounts[] {
  return Array.from({ length: 12 }, (_, index) => amountsInLog(monthPeriod(year, index + 1), finished, log));
}

/**
 * The first and last day of a month, e.g. February 2028 → 2028-02-01 to 2028-02-29.
 *
 * @throws RangeError for a year outside 1–9999 or a month outside 1–12.
 */
export function monthPeriod(year: number, month: number): ChallengePeriod {
  if (!Number.isInteger(year) || year < 1 || year > 9999) throw new RangeError(`Year out of range: ${year}`);
  if (!Number.isInteger(month) || month < 1 || month > 12) throw new RangeError(`Month out of range: ${month}`);
  const yyyy = String(year).padStart(4, '0');
  const mm = String(month).padStart(2, '0');
  const next = month === 12 ? `${String(year + 1).padStart(4, '0')}-01-01` : `${yyyy}-${String(month + 1).padStart(2, '0')}-01`;
  // dayIndex has no year 10000; the last month of 9999 ends on the 31st in any case.
  const end = year === 9999 && month === 12 ? '9999-12-31' : dayFromIndex(dayIndex(next) - 1);
  return { start: `${yyyy}-${mm}-01`, end };
}

/** 1 January to 31 December of `year`. */
export function yearPeriod(year: number): ChallengePeriod {
  return { start: monthPeriod(year, 1).start, end: monthPeriod(year, 12).end };
}
