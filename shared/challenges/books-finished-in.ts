import { parseCalendarDay } from '../calendar/parse-calendar-day';
import { ChallengeBook, ChallengePeriod } from './challenge-book';

/**
 * The finished books whose `finishedOn` falls in the period (both ends included), earliest
 * first; books finished the same day keep a stable order by id. A book finished more than once
 * in the period (a re-read; `books` may hold one entry per finish) counts once, on its latest
 * finish there: a re-read in a later year still counts in that year.
 *
 * @throws RangeError when a finished book's `finishedOn` is not a 'YYYY-MM-DD' date.
 * @example
 * booksFinishedIn(books, { start: '2026-01-01', end: '2026-12-31' }).map((book) => book.id)
 */
export function booksFinishedIn<Book extends ChallengeBook>(books: readonly Book[], period: ChallengePeriod): (Book & { readonly finishedOn: string })[] {
  const finished = books.filter((book): book is Book & { finishedOn: string } => {
    if (book.status !== 'finished' || book.finishedOn === undefined) return false;
    parseCalendarDay(book.finishedOn);
    // Same-shaped ISO 8601 dates sort as text in time order (RFC 3339 §5.1).
    return book.finishedOn >= period.start && book.finishedOn <= period.end;
  });
  const latest = new Map<string, Book & { readonly finishedOn: string }>();
  for (const book of finished) {
    const before = latest.get(book.id);
    if (!before || book.finishedOn > before.finishedOn) latest.set(book.id, book);
  }
  return [...latest.values()].sort((a, b) => compare(a.finishedOn, b.finishedOn) || compare(a.id, b.id));
}

function compare(a: string, b: string): number {
  return a < b ? -1 : a > b ? 1 : 0;
}
