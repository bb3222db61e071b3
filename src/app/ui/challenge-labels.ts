import type { ChallengeProgress } from '@shared/challenges/challenge-progress';
import type { Challenge } from '@shared/sync/schema/collections';

type Kind = NonNullable<Challenge['kind']>;

/** Names of the kinds of challenge, as the reader sees them. */
export const KIND_LABELS: Readonly<Record<Kind, string>> = {
  count: 'Read a number of books',
  alphabet: 'A to Z',
  weekly: 'A book a week',
  prompts: 'Prompts',
};

/** What a kind's progress counts, in the plural. */
const PARTS: Readonly<Record<Kind, [one: string, many: string]>> = {
  count: ['book', 'books'],
  alphabet: ['letter', 'letters'],
  weekly: ['week', 'weeks'],
  prompts: ['prompt', 'prompts'],
};

/**
 * A challenge's progress in a few words: '12 of 25 books', '3 of 26 letters'.
 *
 * @example
 * progressLine(progress) // '12 of 53 weeks'
 */
export function progressLine(progress: ChallengeProgress): string {
  const { done, target } = progress.progress;
  return `${done} of ${target} ${PARTS[progress.kind][target === 1 ? 0 : 1]}`;
}

/** How far along, 0–100, for a progress bar (full once finished). */
export function progressPercent(progress: ChallengeProgress): number {
  const { done, target } = progress.progress;
  return target === 0 ? 0 : Math.min(100, (done / target) * 100);
}

/** A sensible name for a new challenge the reader left unnamed. */
export function defaultChallengeName(kind: Kind, details: { target?: number; year: number }): string {
  switch (kind) {
    case 'count':
      return `${details.target ?? 25} books in ${details.year}`;
    case 'alphabet':
      return `A to Z in ${details.year}`;
    case 'weekly':
      return `A book a week, ${details.year}`;
    case 'prompts':
      return `Prompts for ${details.year}`;
  }
}
