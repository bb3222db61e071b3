import type { CollectionSpec } from '../sync/schema/collection';
import { COLLECTIONS } from '../sync/schema/collections';

/** Every mergeable text field: its collection, field name and longest text. */
export const TEXT_FIELDS: readonly { readonly collection: CollectionSpec; readonly field: string; readonly maxLength: number }[] = Object.values(
  COLLECTIONS,
).flatMap((collection) =>
  Object.entries(collection.fields as CollectionSpec['fields'])
    .filter(([, spec]) => spec.kind === 'text')
    .map(([field, spec]) => ({ collection, field, maxLength: spec.maxLength! })),
);

/** The longest text of a mergeable text field, or undefined when the field is not one. */
export function textFieldMax(collection: string, field: string): number | undefined {
  return TEXT_FIELDS.find((entry) => entry.collection.name === collection && entry.field === field)?.maxLength;
}
