import { localDay } from '../calendar/local-day';
import { ChallengeBook } from '../challenges/challenge-book';
import type { LooseBookRow } from '../books/book-row';

/** What `finishedBooks` reads of a book row. */
export type GoalBookRow = Pick<LooseBookRow, 'id' | 'title' | 'authors' | 'status' | 'statusChangedAt' | 'deleted'>;

/** What `finishedBooks` reads of a reading row (a `readings` row fits). */
export interface GoalReadingRow {
  readonly bookId?: string | null;
  /** The reader's own calendar date, 'YYYY-MM-DD'. */
  readonly finishedOn?: string | null;
  readonly deleted?: boolean | null;
}

/** A book the reader finished, on a known local day: what goals and challenges count. */
export interface FinishedBook extends ChallengeBook {
  readonly status: 'finished';
  readonly finishedOn: string;
}

/**
 * The reader's finished books, one entry per finish, each with the day it was finished, earliest
 * first (ties by id).
 *
 * The days are the `finishedOn` of the book's readings: a book read in 2025 and again in 2026
 * has an entry in each year (`booksFinishedIn` then counts a book once per period, on its latest
 * finish there). A book marked finished without a reading that has a date (the library's quick
 * status change) counts on the local day, in `timeZone`, of its `statusChangedAt`. A book with a
 * dated reading counts as finished even while it is being read again or was later set aside: the
 * reader did finish it, and starting a re-read should not take a book off their year. Deleted
 * books and readings are left out, and so is a finished book with no date at all.
 *
 * @throws RangeError for an unknown time zone or an unreadable `statusChangedAt`.
 * @example
 * finishedBooks([{ id: 'b1', title: 'Tidewater', authors: ['Ada Okafor'], status: 'finished',
 *                  statusChangedAt: '2026-03-01T06:30:00Z' }], [], 'America/Los_Angeles')
 * // [{ id: 'b1', title: 'Tidewater', authors: ['Ada Okafor'], status: 'finished', finishedOn: '2026-02-28' }]
 */
export function finishedBooks(books: readonly GoalBookRow[], readings: readonly GoalReadingRow[], timeZone: string): FinishedBook[] {
  return challengeBooks(books, readings, timeZone)
    .filter((book): book is FinishedBook => book.finishedOn !== undefined)
    .sort((a, b) => compare(a.finishedOn, b.finishedOn) || compare(a.id, b.id));
}

/**
 * Every book of the library (deleted ones left out, order kept) as challenges see it: a finished
 * book once per finish (by the rule of `finishedBooks`), with status 'finished' and its day; the
 * rest once, with their own status ('tbr', 'reading', …) and no day. Prompt challenges need the
 * unfinished books too (a prompt can be planned with one), and alphabet challenges suggest from
 * the TBR.
 *
 * @throws RangeError for an unknown time zone or an unreadable `statusChangedAt`.
 */
export function challengeBooks(books: readonly GoalBookRow[], readings: readonly GoalReadingRow[], timeZone: string): ChallengeBook[] {
  const finishDays = new Map<string, Set<string>>();
  for (const reading of readings) {
    if (reading.deleted || !reading.bookId || !reading.finishedOn) continue;
    const days = finishDays.get(reading.bookId) ?? new Set<string>();
    days.add(reading.finishedOn);
    finishDays.set(reading.bookId, days);
  }

  return books
    .filter((book) => !book.deleted)
    .flatMap((book): ChallengeBook[] => {
      const common = { id: book.id, title: book.title ?? '', authors: book.authors ?? [] };
      // Same-shaped ISO 8601 dates sort as text in time order (RFC 3339 §5.1).
      const days = [...(finishDays.get(book.id) ?? [])].sort();
      if (days.length === 0 && book.status === 'finished' && book.statusChangedAt) days.push(localDay(book.statusChangedAt, timeZone));
      if (days.length === 0) return [{ ...common, status: book.status ?? '' }];
      return days.map((finishedOn) => ({ ...common, status: 'finished', finishedOn }));
    });
}

function compare(a: string, b: string): number {
  return a < b ? -1 : a > b ? 1 : 0;
}
