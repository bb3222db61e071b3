import type { PulledChange } from './field-change';
import { mergeField, type Stamped } from './merge';

/** Every field's winning value, keyed `collection/rowId/field`. */
export type FieldState = ReadonlyMap<string, Stamped>;

export const fieldKey = (change: Pick<PulledChange, 'collection' | 'rowId' | 'field'>) =>
  `${change.collection}/${change.rowId}/${change.field}`;

/**
 * Folds changes into a field state with {@link mergeField}. Because the merge is commutative,
 * associative and idempotent, any order of the same changes (with repeats) gives the same state:
 * this is the reference model the server and the clients are checked against.
 */
export function mergeChanges(state: FieldState, changes: Iterable<PulledChange>): FieldState {
  const next = new Map(state);
  for (const change of changes) {
    const key = fieldKey(change);
    next.set(key, mergeField(next.get(key), { value: change.value, hlc: change.hlc }));
  }
  return next;
}
