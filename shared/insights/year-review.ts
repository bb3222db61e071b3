import { booksFinishedIn } from '../challenges/books-finished-in';
import { monthlyAmounts, yearPeriod } from '../goals/amounts-in';
import { FinishedBook } from '../goals/finished-books';
import { DailyLogEntry } from '../reading-log/log-session';
import { streaks } from '../reading-log/streaks';
import { formatSplit, FormatSplit } from './format-split';
import { ratingSpread } from './rating-spread';
import { topTerms } from './top-terms';
import type { LooseBookRow } from '../books/book-row';

/** What the review reads of a book row. */
export type ReviewBookRow = Pick<LooseBookRow, 'id' | 'title' | 'authors' | 'format' | 'pageCount' | 'genres' | 'rating'>;

/** A book as the review names it. */
export interface ReviewBook {
  readonly id: string;
  readonly title: string;
  readonly authors: readonly string[];
  readonly rating: number | null;
  readonly pageCount: number | null;
}

/** A reader's year in a few figures. */
export interface YearReview {
  readonly year: number;
  readonly books: number;
  /** Pages and minutes from the sessions (as goals count them). */
  readonly pages: number;
  readonly minutes: number;
  readonly readingDays: number;
  /** Longest run of consecutive reading days inside the year. */
  readonly longestStreak: number;
  /** The month with the most minutes (most books on a tie), or null in a year without reading. */
  readonly busiestMonth: { readonly month: string; readonly books: number; readonly minutes: number } | null;
  /** The finished book with the most pages, or null when none has a page count. */
  readonly longestBook: ReviewBook | null;
  readonly topGenre: string | null;
  readonly formats: FormatSplit;
  readonly averageRating: number | null;
  /** Up to three finished books, highest rated first (the later finish first on a tie). */
  readonly highestRated: readonly ReviewBook[];
  /** The reader's own pick of the year, when they made one. */
  readonly bestBook: ReviewBook | null;
}

/**
 * The year in review: books finished in `year` (from `finishedBooks`), the daily log of the
 * year, the longest streak (days after `today` do not count), the busiest month, the longest
 * and highest rated books, formats, the top genre and the reader's best book of the year.
 *
 * @example
 * yearReview({ year: 2026, today: '2026-12-02', finished, books, log, bestBookId: 'b7' }).books // 31
 */
export function yearReview(input: {
  readonly year: number;
  readonly today: string;
  readonly finished: readonly FinishedBook[];
  readonly books: ReadonlyMap<string, ReviewBookRow>;
  readonly log: readonly DailyLogEntry[];
  readonly bestBookId?: string | null;
}): YearReview {
  const { year, today, books, bestBookId } = input;
  const period = yearPeriod(year);
  const finished = booksFinishedIn(input.finished, period)
    .map((book) => ({ finishedOn: book.finishedOn, row: books.get(book.id) }))
    .filter((book): book is { finishedOn: string; row: ReviewBookRow } => book.row !== undefined);
  const rows = finished.map((book) => book.row);

  const yearLog = input.log.filter((entry) => entry.day >= period.start && entry.day <= period.end && entry.minutes + entry.pages > 0);
  const months = monthlyAmounts(year, input.finished, input.log);
  const busiest = months
    .map((amounts, index) => ({ month: `${period.start.slice(0, 4)}-${String(index + 1).padStart(2, '0')}`, ...amounts }))
    .filter((month) => month.minutes > 0 || month.books > 0)
    .sort((a, b) => b.minutes - a.minutes || b.books - a.books)[0];

  const paged = rows.filter((row) => row.pageCount != null).sort((a, b) => (b.pageCount ?? 0) - (a.pageCount ?? 0));
  const rated = finished
    .filter((book) => book.row.rating != null)
    .sort((a, b) => (b.row.rating ?? 0) - (a.row.rating ?? 0) || (a.finishedOn < b.finishedOn ? 1 : a.finishedOn > b.finishedOn ? -1 : 0));
  const best = bestBookId ? books.get(bestBookId) : undefined;

  return {
    year,
    books: rows.length,
    pages: months.reduce((sum, month) => sum + month.pages, 0),
    minutes: months.reduce((sum, month) => sum + month.minutes, 0),
    readingDays: new Set(yearLog.map((entry) => entry.day)).size,
    longestStreak: streaks(
      yearLog.map((entry) => entry.day),
      today < period.end ? today : period.end,
    ).longest,
    busiestMonth: busiest ? { month: busiest.month, books: busiest.books, minutes: busiest.minutes } : null,
    longestBook: paged[0] ? reviewBook(paged[0]) : null,
    topGenre:
      topTerms(
        rows.map((row) => row.genres),
        1,
      ).top[0]?.term ?? null,
    formats: formatSplit(rows),
    averageRating: ratingSpread(rows.map((row) => row.rating)).mean,
    highestRated: rated.slice(0, 3).map((book) => reviewBook(book.row)),
    bestBook: best ? reviewBook(best) : null,
  };
}

function reviewBook(row: ReviewBookRow): ReviewBook {
  return { id: row.id, title: row.title ?? '', authors: row.authors ?? [], rating: row.rating ?? null, pageCount: row.pageCount ?? null };
}
