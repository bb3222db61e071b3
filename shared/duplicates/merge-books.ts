import type { BookIdentity } from './book-keys';
import type { CollectionName } from '../sync/schema/collections';
import type { ReferenceMove } from './book-references';

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
  /** Series membership: which series, and where in it. */
  'seriesId',
  'seriesPosition',
] as const;
export type MergeField = (typeof MERGE_FIELDS)[number];

type Book = BookIdentity & { readonly id: string } & Readonly<Record<string, unknown>>;

/** One row write, as `JournalStore.writeAll` takes it. */
export interface MergeWrite {
  readonly collection: CollectionName;
  readonly rowId: string;
  readonly patch: Readonly<Record<string, unknown>>;
}

/** The fields that differ between two books: what the merge dialog asks about. */
export function differingFields(kept: Book, other: Book): MergeField[] {
  return MERGE_FIELDS.filter((field) => JSON.stringify(kept[field] ?? null) !== JSON.stringify(other[field] ?? null));
}

/**
 * Merges `other` into `kept`: the kept book takes the value the reader picked for each field
 * (`'other'` picks the other book's), every reference to the other book (`moves`, from
 * `referenceMoves` in book-references.ts: readings, sessions, quotes, status changes, loans,
 * plans, picks, challenge prompts, favourites, notebooks, the timer) points at the kept one, and
 * the other book becomes a tombstone. One list of journal writes, for one transaction; circle
 * links are left to the circle's own store.
 */
export function mergeBooks(kept: Book, other: Book, picks: Readonly<Partial<Record<MergeField, 'kept' | 'other'>>>, moves: readonly ReferenceMove[]): MergeWrite[] {
  const patch: Record<string, unknown> = {};
  for (const field of MERGE_FIELDS) {
    if (picks[field] === 'other' && other[field] !== undefined) patch[field] = other[field];
  }
  return [
    ...(Object.keys(patch).length > 0 ? [{ collection: 'books' as const, rowId: kept.id, patch }] : []),
    ...moves.filter((move) => !move.circle).map(({ collection, rowId, patch: moved }) => ({ collection: collection as CollectionName, rowId, patch: moved })),
    { collection: 'books' as const, rowId: other.id, patch: { deleted: true } },
  ];
}
