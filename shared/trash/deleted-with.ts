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

/** A parent a row of some collection belongs to: the collection and the field naming it. */
export interface Parent {
  readonly collection: CollectionName;
  readonly ref: string;
}

/**
 * The parents whose delete takes rows of `collection` with it (a session's book, a page's
 * notebook). A row restored on its own while its parent is in Trash brings the parent back too:
 * a session of a deleted book would show nowhere.
 */
export const parentsOf = (collection: CollectionName): readonly Parent[] =>
  (Object.entries(DELETED_WITH) as [CollectionName, readonly Dependent[]][]).flatMap(([parent, dependents]) =>
    dependents.filter((dependent) => dependent.collection === collection).map(({ ref }) => ({ collection: parent, ref })),
  );
