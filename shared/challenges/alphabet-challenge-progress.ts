import { alphabetKey } from './alphabet-key';
import { booksFinishedIn } from './books-finished-in';
import { ChallengeBook, ChallengePeriod, ChallengeStatus } from './challenge-book';
import { challengeStatus } from './challenge-status';

const LETTERS = Array.from({ length: 26 }, (_, index) => String.fromCharCode(65 + index));

export interface AlphabetLetter {
  readonly letter: string;
  /** The book that filled the letter (the earliest finished), or null while open. */
  readonly bookId: string | null;
}

export interface AlphabetChallengeProgress extends ChallengeStatus {
  readonly by: 'title' | 'author-surname';
  /** A to Z, in order. */
  readonly letters: readonly AlphabetLetter[];
  /** Letters still to fill, A to Z. */
  readonly open: readonly string[];
  /** For each open letter, the to-read books that would fill it, in the order given. */
  readonly suggestions: Readonly<Record<string, readonly string[]>>;
}

/**
 * An A–Z challenge: each letter is filled by the earliest book finished in the period whose
 * title (or first author's surname) files under it, per `alphabetKey`. A book fills one letter.
 *
 * @param tbr the reader's to-read books, searched for books that would fill open letters.
 * @example
 * const progress = alphabetChallengeProgress({ by: 'title', period, books, tbr });
 * progress.open // ['B', 'C', …]
 * progress.suggestions['B'] // ['tbr-3']
 */
export function alphabetChallengeProgress(input: {
  readonly by: 'title' | 'author-surname';
  readonly period: ChallengePeriod;
  readonly books: readonly ChallengeBook[];
  readonly tbr: readonly ChallengeBook[];
}): AlphabetChallengeProgress {
  const { by, period } = input;
  const keyOf = (book: ChallengeBook) => alphabetKey(by === 'title' ? book.title : (book.authors[0] ?? ''), by);

  const filled = new Map<string, string>();
  for (const book of booksFinishedIn(input.books, period)) {
    const key = keyOf(book);
    if (key !== null && !filled.has(key)) filled.set(key, book.id);
  }

  const letters = LETTERS.map((letter) => ({ letter, bookId: filled.get(letter) ?? null }));
  const open = LETTERS.filter((letter) => !filled.has(letter));
  const countedIds = new Set(filled.values());
  const suggestions: Record<string, string[]> = Object.fromEntries(open.map((letter) => [letter, []]));
  for (const book of input.tbr) {
    const key = keyOf(book);
    if (key !== null && key in suggestions && !countedIds.has(book.id)) suggestions[key].push(book.id);
  }

  const counted = letters.flatMap((entry) => (entry.bookId === null ? [] : [entry.bookId]));
  return { ...challengeStatus({ period, done: counted.length, target: 26, counted }), by, letters, open, suggestions };
}
