import type { Book, Quote } from '@shared/sync/schema/collections';

import { isCurrent, type JournalDb } from '../../core/data/journal-db';
import { newestFirst } from './quote-query';

/** Every quote kept, and every book, deleted ones too: their quotes still name where they came from. */
export interface AllQuotes {
  readonly quotes: Quote[];
  readonly books: Book[];
}

export async function allQuotes(db: JournalDb): Promise<AllQuotes> {
  const [quotes, books] = await Promise.all([db.current('quotes'), db.rows('books').toArray()]);
  return { quotes, books };
}

/** One book and the quotes kept from it, newest first. */
export async function bookQuotes(db: JournalDb, bookId: string): Promise<{ book: Book | undefined; quotes: Quote[] }> {
  const [book, quotes] = await Promise.all([db.rows('books').get(bookId), db.rows('quotes').where('bookId').equals(bookId).filter(isCurrent).toArray()]);
  return { book, quotes: quotes.sort(newestFirst) };
}

/** The books still on the shelf, to choose the one a quote comes from. */
export const booksToQuote = (db: JournalDb): Promise<Book[]> => db.current('books');
