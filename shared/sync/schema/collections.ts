import { defineCollection, type RowOf } from './collection';
import { field } from './field';

export const BOOK_FORMATS = ['print', 'ebook', 'audiobook'] as const;
export const BOOK_STATUSES = ['tbr', 'reading', 'paused', 'finished', 'dnf'] as const;

/** The books of a reader's library. */
export const books = defineCollection(
  'books',
  {
    title: field.text(500),
    authors: field.textList(20, 200),
    format: field.choice(BOOK_FORMATS),
    status: field.choice(BOOK_STATUSES),
    /** Half-star ratings from 0.5 to 5. */
    rating: field.optionalNumber(0.5, 5, 0.5),
    pageCount: field.optionalInteger(1, 100_000),
    isbn: field.optionalIsbn13(),
  },
  { indexes: ['status', 'title'] },
);
export type Book = RowOf<typeof books>;

/** Every synced collection, by name: the one source of truth for Dexie, zod and TypeORM. */
export const COLLECTIONS = { books } as const;
export type CollectionName = keyof typeof COLLECTIONS;

export function collectionSpec(name: string) {
  return Object.hasOwn(COLLECTIONS, name) ? COLLECTIONS[name as CollectionName] : undefined;
}
