import { defineCollection, type RowOf } from './collection';
import { field } from './field';

export const BOOK_FORMATS = ['print', 'ebook', 'audiobook'] as const;
export const BOOK_STATUSES = ['tbr', 'reading', 'paused', 'finished', 'dnf'] as const;
/** Where the reader's copy is. */
export const BOOK_COPIES = ['owned', 'borrowed', 'library', 'wishlist'] as const;
export const RECOMMEND_ANSWERS = ['yes', 'maybe', 'no'] as const;

/** The books of a reader's library. */
export const books = defineCollection(
  'books',
  {
    title: field.text(500),
    subtitle: field.optionalText(500),
    authors: field.textList(20, 200),
    format: field.choice(BOOK_FORMATS),
    /** Length in the book's own unit: pages for print and ebook, minutes for audiobooks. */
    pageCount: field.optionalInteger(1, 100_000),
    audioMinutes: field.optionalInteger(1, 20_000),
    isbn: field.optionalIsbn13(),
    publisher: field.optionalText(200),
    year: field.optionalInteger(1, 3000),
    language: field.optionalLanguage(),
    genres: field.textList(20, 60),
    tags: field.textList(40, 60),
    status: field.choice(BOOK_STATUSES),
    /** When the status last changed; every change is also kept in `bookStatusChanges`. */
    statusChangedAt: field.optionalTimestamp(),
    copy: field.optionalChoice(BOOK_COPIES),
    coverId: field.optionalUploadId(),
    /** The reader's rating of the book (the latest reading's, unless they set it themselves). */
    rating: field.optionalNumber(0.5, 5, 0.5),
  },
  { indexes: ['status', 'title'] },
);
export type Book = RowOf<typeof books>;

/**
 * Every status change of a book, one row each. A new row per change (never an edited list) so
 * changes made on two devices offline both survive the merge.
 */
export const bookStatusChanges = defineCollection(
  'bookStatusChanges',
  {
    bookId: field.optionalRef(),
    status: field.choice(BOOK_STATUSES),
    changedAt: field.optionalTimestamp(),
  },
  { indexes: ['bookId'] },
);
export type BookStatusChange = RowOf<typeof bookStatusChanges>;

/** One reading of a book, with its review. A re-read is another reading with its own dates. */
export const readings = defineCollection(
  'readings',
  {
    bookId: field.optionalRef(),
    startedOn: field.optionalDate(),
    finishedOn: field.optionalDate(),
    rating: field.optionalNumber(0.5, 5, 0.5),
    /** The review in one line. */
    summary: field.optionalText(200),
    review: field.optionalText(20_000),
    takeaways: field.optionalText(5_000),
    recommend: field.optionalChoice(RECOMMEND_ANSWERS),
    recommendTo: field.optionalText(200),
  },
  { indexes: ['bookId'] },
);
export type Reading = RowOf<typeof readings>;

/** Every synced collection, by name: the one source of truth for Dexie, zod and TypeORM. */
export const COLLECTIONS = { books, bookStatusChanges, readings } as const;
export type CollectionName = keyof typeof COLLECTIONS;

export function collectionSpec(name: string) {
  return Object.hasOwn(COLLECTIONS, name) ? COLLECTIONS[name as CollectionName] : undefined;
}
