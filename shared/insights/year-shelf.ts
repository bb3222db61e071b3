import { booksFinishedIn } from '../challenges/books-finished-in';
import { yearPeriod } from '../goals/amounts-in';
import type { FinishedBook } from '../goals/finished-books';
import type { LooseBookRow } from '../books/book-row';

/** What the shelf reads of a book row. */
export type ShelfBookRow = Pick<LooseBookRow, 'id' | 'title' | 'authors' | 'format' | 'pageCount' | 'audioMinutes'>;

/** One finished book drawn as a spine on the year's shelf. */
export interface ShelfSpine {
  readonly id: string;
  readonly title: string;
  readonly authors: readonly string[];
  readonly format: 'print' | 'ebook' | 'audiobook';
  readonly finishedOn: string;
  /** The book's length in pages (an audiobook's counted from its minutes), or null when unknown. */
  readonly pages: number | null;
  /** The spine's height as a share of the shelf, 0.3–1. */
  readonly height: number;
}

/**
 * Narrated audiobooks run at about 150 words a minute and a printed page holds about 300 words,
 * so one page is about two minutes of listening: a product rule of thumb for the spine's height only.
 */
export const AUDIO_MINUTES_PER_PAGE = 2;
/** A book of this many pages or more stands full height; shorter ones stand in proportion. */
export const TALLEST_PAGES = 1000;
/** The shortest spine (so a novella still shows) and the height of a book of unknown length. */
const SHORTEST = 0.3;
const UNKNOWN = 0.6;

/**
 * The books finished in `year` as spines, in the order they were finished (a book finished twice
 * stands once, at its latest finish); height from length, so a long book stands taller.
 *
 * @example
 * yearShelf(finished, books, 2026)[0] // { title: 'Evening Tide', format: 'print', pages: 500, height: 0.65, … }
 */
export function yearShelf(finished: readonly FinishedBook[], books: ReadonlyMap<string, ShelfBookRow>, year: number): ShelfSpine[] {
  return booksFinishedIn(finished, yearPeriod(year))
    .flatMap((book) => {
      const row = books.get(book.id);
      return row ? [spine(row, book.finishedOn)] : [];
    })
    .sort((a, b) => (a.finishedOn < b.finishedOn ? -1 : a.finishedOn > b.finishedOn ? 1 : a.title.localeCompare(b.title)));
}

function spine(row: ShelfBookRow, finishedOn: string): ShelfSpine {
  const format = row.format === 'ebook' || row.format === 'audiobook' ? row.format : 'print';
  const pages = format === 'audiobook' ? (row.audioMinutes ? Math.round(row.audioMinutes / AUDIO_MINUTES_PER_PAGE) : null) : (row.pageCount ?? null);
  const height = pages === null ? UNKNOWN : SHORTEST + (1 - SHORTEST) * (Math.min(pages, TALLEST_PAGES) / TALLEST_PAGES);
  return { id: row.id, title: row.title ?? '', authors: row.authors ?? [], format, finishedOn, pages, height };
}
