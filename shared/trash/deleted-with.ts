import type { CollectionName } from '../sync/schema/collections';

/** A collection whose rows point at a parent through `ref`. */
export interface Dependent {
  readonly collection: CollectionName;
  readonly ref: string;
}

/**
 * What is deleted together with a row of a collection (in one write, so with the delete's one
 * clock) and restored with it. Anything else pointing at the row (a series' books, a notebook
 * about a book, a favourite) stays; screens treat a link to a deleted row as no link.
 */
export const DELETED_WITH: Partial<Record<CollectionName, readonly Dependent[]>> = {
  books: [
    { collection: 'readings', ref: 'bookId' },
    { collection: 'sessions', ref: 'bookId' },
    { collection: 'quotes', ref: 'bookId' },
    { collection: 'bookStatusChanges', ref: 'bookId' },
  ],
  notebooks: [{ collection: 'notebookPages', ref: 'notebookId' }],
};

/** The collections deleted with a row of `collection` (none for most). */
export const dependentsOf = (collection: CollectionName): readonly Dependent[] => DELETED_WITH[collection] ?? [];
