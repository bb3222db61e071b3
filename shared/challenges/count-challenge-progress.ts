import { ChallengeBook, ChallengePeriod, ChallengeStatus } from './challenge-book';
import { challengeStatus } from './challenge-status';
import { booksFinishedIn } from './books-finished-in';

/** Ready-made targets offered when a reader starts a "read N books" challenge. */
export const COUNT_CHALLENGE_TARGETS = [25, 50, 100] as const;

/**
 * A "read N books" challenge: every book finished in the period counts, earliest first.
 *
 * @throws RangeError for a target that is not a whole number from 1, or a bad period.
 * @example
 * countChallengeProgress({ target: 25, period: { start: '2026-01-01', end: '2026-12-31' }, books })
 * // { period, done: 3, target: 25, counted: ['b2', 'b7', 'b1'], finished: false }
 */
export function countChallengeProgress(input: {
  readonly target: number;
  readonly period: ChallengePeriod;
  readonly books: readonly ChallengeBook[];
}): ChallengeStatus {
  if (!Number.isInteger(input.target) || input.target < 1) throw new RangeError(`Target must be a whole number from 1: ${input.target}`);
  const counted = booksFinishedIn(input.books, input.period).map((book) => book.id);
  return challengeStatus({ period: input.period, done: counted.length, target: input.target, counted });
}
