import type { Book, Reading } from '@shared/sync/schema/collections';

export { authorLine } from '@shared/journal/author-line';

/** Words readers see for each format and status. TBR and DNF are readers' own terms. */
export const FORMAT_LABELS: Record<NonNullable<Book['format']>, string> = {
  print: 'Print',
  ebook: 'Ebook',
  audiobook: 'Audiobook',
};

export const STATUS_LABELS: Record<NonNullable<Book['status']>, string> = {
  tbr: 'TBR',
  reading: 'Reading',
  paused: 'Paused',
  finished: 'Finished',
  dnf: 'DNF',
};

/** Where the copy is. */
export const COPY_LABELS: Record<NonNullable<Book['copy']>, string> = {
  owned: 'On my shelf',
  borrowed: 'Borrowed',
  library: 'From the library',
  wishlist: 'On my wishlist',
};

/** How much a wishlist book is wanted. */
export const WISH_PRIORITY_LABELS: Record<NonNullable<Book['wishPriority']>, string> = {
  high: 'Soon, please',
  medium: 'Some day',
  low: 'If it comes my way',
};

export const RECOMMEND_LABELS: Record<NonNullable<Reading['recommend']>, string> = {
  yes: 'Yes',
  maybe: 'Maybe',
  no: 'No',
};

/** The book's length in its own unit: "320 pages", "11 h 5 min". */
export function lengthLine(book: Pick<Book, 'format' | 'pageCount' | 'audioMinutes'>): string {
  if (book.format === 'audiobook') {
    const minutes = book.audioMinutes;
    if (!minutes) return '';
    const hours = Math.floor(minutes / 60);
    return hours > 0 ? `${hours} h ${minutes % 60} min` : `${minutes} min`;
  }
  return book.pageCount ? `${book.pageCount} pages` : '';
}
