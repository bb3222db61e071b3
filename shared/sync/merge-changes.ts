import type { PulledChange } from '../api/sync';
import { mergeField, type Stamped } from './merge';
import { mergeSetField } from './merge-set';
import type { OrSetState } from './or-set';
import { fieldSpecOf } from './schema/collections';

/** Every field's winning value (and a set field's state), keyed `collection/rowId/field`. */
export type FieldState = ReadonlyMap<string, Stamped & { readonly state?: OrSetState }>;

export const fieldKey = (change: Pick<PulledChange, 'collection' | 'rowId' | 'field'>) => `${change.collection}/${change.rowId}/${change.field}`;

/**
 * Folds changes into a field state with {@link mergeField} ({@link mergeSetField} for set fields). Because the merge is commutative,
 * associative and idempotent, any order of the same changes (with repeats) gives the same state:
 * this is the reference model the server and the clients are checked against.
 */
export function mergeChanges(state: FieldState, changes: Iterable<PulledChange>): FieldState {
  const next = new Map(state);
  for (const change of changes) {
    const key = fieldKey(change);
    if (fieldSpecOf(change.collection, change.field)?.kind === 'set') next.set(key, mergeSetField(next.get(key), change));
    else next.set(key, mergeField(next.get(key), { value: change.value, hlc: change.hlc }));
  }
  return next;
}
