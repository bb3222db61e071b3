import { booksFinishedIn } from './books-finished-in';
import { ChallengeBook, ChallengePeriod, ChallengeStatus } from './challenge-book';
import { challengeStatus } from './challenge-status';

export interface ChallengePrompt {
  readonly id: string;
  /** The reader's (or the challenge's) wording, e.g. "A book set on an island". */
  readonly text: string;
  /** The book the reader picked for it, if any. */
  readonly bookId?: string;
}

export type PromptState = 'open' | 'planned' | 'done';

export interface PromptProgress {
  readonly id: string;
  readonly text: string;
  /** The picked book, or null when none is picked or it is no longer in the library. */
  readonly bookId: string | null;
  /** 'done': the picked book was finished in the period; 'planned': picked, not yet finished. */
  readonly state: PromptState;
}

export interface PromptChallengeProgress extends ChallengeStatus {
  readonly prompts: readonly PromptProgress[];
}

/**
 * A prompt challenge ("a book with a bird on the cover", …): each prompt is done once the book
 * the reader picked for it is finished within the period. The same book may answer more than
 * one prompt; it is listed once in `counted`.
 *
 * @example
 * promptChallengeProgress({ period, prompts: [{ id: 'p1', text: 'A book set in an orchard', bookId: 'b1' }], books })
 * // { done: 1, target: 1, finished: true, counted: ['b1'], prompts: [{ …, state: 'done' }], period }
 */
export function promptChallengeProgress(input: {
  readonly period: ChallengePeriod;
  readonly prompts: readonly ChallengePrompt[];
  readonly books: readonly ChallengeBook[];
}): PromptChallengeProgress {
  const known = new Set(input.books.map((book) => book.id));
  const finished = new Set(booksFinishedIn(input.books, input.period).map((book) => book.id));

  const prompts = input.prompts.map((prompt): PromptProgress => {
    const bookId = prompt.bookId !== undefined && known.has(prompt.bookId) ? prompt.bookId : null;
    const state: PromptState = bookId === null ? 'open' : finished.has(bookId) ? 'done' : 'planned';
    return { id: prompt.id, text: prompt.text, bookId, state };
  });
  const donePrompts = prompts.filter((prompt) => prompt.state === 'done');
  const counted = [...new Set(donePrompts.map((prompt) => prompt.bookId!))];
  return { ...challengeStatus({ period: input.period, done: donePrompts.length, target: prompts.length, counted }), prompts };
}
