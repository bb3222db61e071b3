import { CIRCLE_COLLECTIONS } from '../circles/circle-collections';
import { COLLECTIONS } from '../sync/schema/collections';
import type { BookIdsIn, FieldSpec } from '../sync/schema/field';

/** A field of some collection that holds book ids, and how (see {@link BookIdsIn}). */
export interface BookReference {
  readonly collection: string;
  readonly field: string;
  readonly holds: BookIdsIn;
  /** A circle collection (written through the circle's own outbox), not the reader's journal. */
  readonly circle: boolean;
}

function referencesIn(collections: Readonly<Record<string, { readonly fields: Readonly<Record<string, FieldSpec>> }>>, circle: boolean): BookReference[] {
  return Object.entries(collections).flatMap(([collection, { fields }]) =>
    Object.entries(fields).flatMap(([field, spec]) => (spec.bookIds ? [{ collection, field, holds: spec.bookIds, circle }] : [])),
  );
}

/**
 * Every field that holds a book id, read from the shared schema (the fields built with
 * `field.optionalBookRef()`, or `field.json(…, bookIds)`): what a merge of two books moves.
 */
export const BOOK_REFERENCES: readonly BookReference[] = [...referencesIn(COLLECTIONS, false), ...referencesIn(CIRCLE_COLLECTIONS, true)];

/**
 * The field's value with every `from` book id turned into `to`, or `undefined` when it holds
 * none (nothing to write).
 */
export function movedBookIds(value: unknown, holds: BookIdsIn, from: string, to: string): unknown {
  if (holds === 'value') return value === from ? to : undefined;
  if (holds === 'entries') {
    if (!Array.isArray(value) || !value.some((entry: { bookId?: unknown } | null) => entry?.bookId === from)) return undefined;
    return value.map((entry: { bookId?: unknown } | null) => (entry?.bookId === from ? { ...entry, bookId: to } : entry));
  }
  if (value === null || typeof value !== 'object') return undefined;
  const record = value as Readonly<Record<string, unknown>>;
  if (!Object.values(record).includes(from)) return undefined;
  return Object.fromEntries(Object.entries(record).map(([key, id]) => [key, id === from ? to : id]));
}

/** One row's write that moves its book references, for a store's write. */
export interface ReferenceMove {
  readonly collection: string;
  readonly rowId: string;
  readonly circle: boolean;
  readonly patch: Readonly<Record<string, unknown>>;
}

/**
 * The writes that point every reference to book `from` at book `to`, for the given rows of each
 * collection (rows keyed by collection name; those without a reference give no write).
 */
export function referenceMoves(rowsByCollection: Readonly<Record<string, readonly Readonly<Record<string, unknown>>[]>>, from: string, to: string): ReferenceMove[] {
  const moves = new Map<string, ReferenceMove>();
  for (const { collection, field, holds, circle } of BOOK_REFERENCES) {
    for (const row of rowsByCollection[collection] ?? []) {
      const moved = movedBookIds(row[field], holds, from, to);
      if (moved === undefined) continue;
      const key = `${collection}\u0000${String(row['id'])}`;
      const known = moves.get(key);
      moves.set(key, { collection, rowId: String(row['id']), circle, patch: { ...known?.patch, [field]: moved } });
    }
  }
  return [...moves.values()];
}
