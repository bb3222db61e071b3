import type { BookIdentity } from './book-keys';

/** Rows that point at a book and move to the kept one when two books merge. */
export const BOOK_CHILDREN = ['readings', 'sessions', 'quotes', 'bookStatusChanges', 'notebooks', 'favourites', 'monthPicks'] as const;
export type BookChild = (typeof BOOK_CHILDREN)[number];

/** Fields a merge lets the reader choose between (the rest stay the kept book's). */
export const MERGE_FIELDS = [
  'title',
  'subtitle',
  'authors',
  'isbn',
  'format',
  'status',
  'rating',
  'pageCount',
  'audioMinutes',
  'publisher',
  'year',
  'tags',
  'coverId',
] as const;
export type MergeField = (typeof MERGE_FIELDS)[number];

type Book = BookIdentity & { readonly id: string } & Readonly<Record<string, unknown>>;

/** One row write, as `JournalStore.writeAll` takes it. */
export interface MergeWrite {
  readonly collection: 'books' | BookChild;
  readonly rowId: string;
  readonly patch: Readonly<Record<string, unknown>>;
}

/** The fields that differ between two books: what the merge dialog asks about. */
export function differingFields(kept: Book, other: Book): MergeField[] {
  return MERGE_FIELDS.filter((field) => JSON.stringify(kept[field] ?? null) !== JSON.stringify(other[field] ?? null));
}

/**
 * Merges `other` into `kept`: the kept book takes the value the reader picked for each field
 * (`'other'` picks the other book's), every reading, session, quote, status change, notebook,
 * favourite and month pick of the other book moves to the kept one, and the other book becomes a
 * tombstone. One list of writes, to be written in one transaction.
 */
export function mergeBooks(
  kept: Book,
  other: Book,
  picks: Readonly<Partial<Record<MergeField, 'kept' | 'other'>>>,
  children: readonly { readonly collection: BookChild; readonly id: string }[],
): MergeWrite[] {
  const patch: Record<string, unknown> = {};
  for (const field of MERGE_FIELDS) {
    if (picks[field] === 'other' && other[field] !== undefined) patch[field] = other[field];
  }
  return [
    ...(Object.keys(patch).length > 0 ? [{ collection: 'books' as const, rowId: kept.id, patch }] : []),
    ...children.map(({ collection, id }) => ({ collection, rowId: id, patch: { bookId: kept.id } })),
    { collection: 'books', rowId: other.id, patch: { deleted: true } },
  ];
}
