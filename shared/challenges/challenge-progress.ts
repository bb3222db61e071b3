import { format } from 'date-fns';

import { isoWeekOf } from '../calendar/iso-week-of';
import { parseHlc } from '../sync/hlc';
import { alphabetChallengeProgress, AlphabetChallengeProgress } from './alphabet-challenge-progress';
import { ChallengeBook, ChallengeStatus } from './challenge-book';
import { countChallengeProgress } from './count-challenge-progress';
import { promptChallengeProgress, PromptChallengeProgress } from './prompt-challenge-progress';
import { weeklyChallengeProgress, WeeklyChallengeProgress } from './weekly-challenge-progress';

/** What `challengeProgress` reads of a challenge row (a `challenges` row fits). */
export interface ChallengeRow {
  readonly kind?: 'count' | 'alphabet' | 'weekly' | 'prompts' | null;
  readonly periodStart?: string | null;
  readonly periodEnd?: string | null;
  readonly target?: number | null;
  readonly alphabetBy?: 'title' | 'author-surname' | null;
  /** A local row's clock per field (`LocalRow._hlc`): the kind's tells when the challenge was made. */
  readonly _hlc?: Readonly<Record<string, string>> | null;
  readonly prompts?: readonly { readonly id: string; readonly text: string; readonly bookId?: string | null }[] | null;
}

/** A challenge's progress, by kind. */
export type ChallengeProgress =
  | { readonly kind: 'count'; readonly progress: ChallengeStatus }
  | { readonly kind: 'alphabet'; readonly progress: AlphabetChallengeProgress }
  | { readonly kind: 'weekly'; readonly progress: WeeklyChallengeProgress }
  | { readonly kind: 'prompts'; readonly progress: PromptChallengeProgress };

/**
 * The progress of one challenge row, by its kind, or null when the row lacks what its kind
 * needs (a period; a count's target) — a row still arriving field by field from another device.
 * A weekly challenge runs over the ISO week-numbering year of its `periodStart` (the Monday of
 * its week 1).
 *
 * Every kind counts from the same books, so one book can count in several challenges.
 *
 * @param library every book of the library, the finished ones with their day (see
 *   `challengeBooks` in shared/goals); its 'tbr' books are the alphabet suggestions.
 * @param today the reader's local date, for weeks met or missed.
 * @example
 * challengeProgress({ kind: 'count', target: 25, periodStart: '2026-01-01', periodEnd: '2026-12-31' }, { library, today })
 * // { kind: 'count', progress: { done: 2, target: 25, finished: false, … } }
 */
export function challengeProgress(
  challenge: ChallengeRow,
  { library, today }: { readonly library: readonly ChallengeBook[]; readonly today: string },
): ChallengeProgress | null {
  const { periodStart: start, periodEnd: end } = challenge;
  if (!start || !end || end < start) return null;
  const period = { start, end };
  switch (challenge.kind) {
    case 'count':
      return challenge.target ? { kind: 'count', progress: countChallengeProgress({ target: challenge.target, period, books: library }) } : null;
    case 'alphabet':
      return {
        kind: 'alphabet',
        progress: alphabetChallengeProgress({ by: challenge.alphabetBy ?? 'title', period, books: library, tbr: library.filter((book) => book.status === 'tbr') }),
      };
    case 'weekly':
      return {
        kind: 'weekly',
        progress: weeklyChallengeProgress({ year: isoWeekOf(start).year, books: library, today, countsFrom: start, createdOn: madeOn(challenge._hlc) }),
      };
    case 'prompts': {
      const prompts = (challenge.prompts ?? []).map((prompt) => ({ id: prompt.id, text: prompt.text, bookId: prompt.bookId ?? undefined }));
      return { kind: 'prompts', progress: promptChallengeProgress({ period, prompts, books: library }) };
    }
    default:
      return null;
  }
}

/** The local day a row's kind was first written, which for a challenge is the day it was made. */
function madeOn(clocks: ChallengeRow['_hlc']): string | undefined {
  const clock = clocks?.['kind'] ? parseHlc(clocks['kind']) : null;
  return clock ? format(clock.wall, 'yyyy-MM-dd') : undefined;
}
