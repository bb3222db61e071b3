import { ChallengeBook } from '../challenges/challenge-book';
import { DailyLogEntry } from '../reading-log/log-session';
import { amountsInLog, RECENT_DAYS, recentRatesPerDay, yearPeriod } from './amounts-in';
import { goalPacing, GoalPacing } from './goal-pacing';
import { AmountsByUnit, GOAL_UNITS, GoalUnit } from './goal-unit';
import { pacingMessage } from './pacing-message';

/** One unit of a yearly goal: how it is going, and the calm line to show for it. */
export interface YearUnitPacing {
  readonly unit: GoalUnit;
  readonly pacing: GoalPacing;
  readonly message: string;
}

/**
 * The pace of each unit of a yearly goal that has a target, in the order of `GOAL_UNITS`: the
 * amount done in the year so far, and a forecast from the last `RECENT_DAYS` days ending today.
 *
 * @param finished from `finishedBooks`; `log` from `sessionLog`.
 * @example
 * yearGoalPacing({ targets: { books: 24 }, year: 2026, today: '2026-07-01', finished, log })
 * // [{ unit: 'books', pacing: { expectedByToday: 11.9…, … }, message: 'Right on an even pace for 24 books' }]
 */
export function yearGoalPacing(input: {
  readonly targets: AmountsByUnit;
  readonly year: number;
  readonly today: string;
  readonly finished: readonly ChallengeBook[];
  readonly log: readonly DailyLogEntry[];
}): YearUnitPacing[] {
  const { targets, year, today, finished, log } = input;
  const actual = amountsInLog(yearPeriod(year), finished, log);
  const recent = recentRatesPerDay(today, finished, log, RECENT_DAYS);
  return GOAL_UNITS.filter((unit) => targets[unit] !== undefined).map((unit) => {
    const pacing = goalPacing({ target: targets[unit]!, actual: actual[unit], year, today, recentRatePerDay: recent[unit] });
    return { unit, pacing, message: pacingMessage(pacing, unit) };
  });
}
