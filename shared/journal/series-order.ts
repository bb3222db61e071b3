import type { Book } from '../sync/schema/collections';

const collator = new Intl.Collator('en', { numeric: true, sensitivity: 'base' });

/**
 * A series' books in reading order: by position (1, 2, 2.5, 3…), books without a position last,
 * then by title. Deleted books and books of other series are left out.
 *
 * @example
 * seriesBooks(library, 'series-1').map((b) => b.seriesPosition) // [1, 2, 2.5, 3, undefined]
 */
export function seriesBooks(books: readonly Book[], seriesId: string): Book[] {
  return books
    .filter((book) => book.seriesId === seriesId && !book.deleted)
    .sort((a, b) => {
      const [pa, pb] = [a.seriesPosition ?? null, b.seriesPosition ?? null];
      if (pa !== pb) {
        if (pa === null) return 1;
        if (pb === null) return -1;
        return pa - pb;
      }
      return collator.compare(a.title ?? '', b.title ?? '');
    });
}

export interface SeriesProgress {
  readonly finished: number;
  /** The planned number of books when known and larger than what the reader tracks. */
  readonly total: number;
  /** 0 to 1. */
  readonly fraction: number;
}

/** How far through a series the reader is: finished books of the planned (or known) total. */
export function seriesProgress(ordered: readonly Book[], plannedCount?: number | null): SeriesProgress {
  const finished = ordered.filter((book) => book.status === 'finished').length;
  const total = Math.max(plannedCount ?? 0, ordered.length);
  return { finished, total, fraction: total === 0 ? 0 : finished / total };
}

/**
 * The book to read next in a series: after `justFinished` when given (the first one after it in
 * order that is still to read, else the first earlier one), otherwise the first in order still
 * to read. "Still to read" means TBR or paused: not finished, not given up (DNF), not already
 * being read.
 */
export function nextUnread(ordered: readonly Book[], justFinishedId?: string): Book | null {
  const toRead = (book: Book) => book.status === 'tbr' || book.status === 'paused' || book.status === undefined;
  const from = justFinishedId ? ordered.findIndex((book) => book.id === justFinishedId) : -1;
  return ordered.slice(from + 1).find(toRead) ?? ordered.slice(0, Math.max(from, 0)).find(toRead) ?? null;
}
