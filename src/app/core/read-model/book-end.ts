import type { Book } from '@shared/sync/schema/collections';

/**
 * Where the book ends in its own unit: its page count (print), 100 percent (ebook) or its
 * listening minutes (audiobook); null when the length is not known.
 */
export function bookEnd(book: Pick<Book, 'format' | 'pageCount' | 'audioMinutes'>): number | null {
  if (book.format === 'ebook') return 100;
  if (book.format === 'audiobook') return book.audioMinutes ?? null;
  return book.pageCount ?? null;
}
