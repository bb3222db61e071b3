import type { PulledChange } from '../api/sync';
import { wins } from './merge';
import { mergeSetField } from './merge-set';
import type { OrSetState } from './or-set';

/**
 * A row as a device keeps it: its field values plus, under `_hlc`, the clock of each field's
 * value. The clocks are what let a device merge pulled values with its own pending edits.
 */
export interface LocalRow {
  readonly id: string;
  readonly _hlc: Readonly<Record<string, string>>;
  /** Set fields' per-element states (shared/sync/or-set.ts); the field itself holds the elements. */
  readonly _sets?: Readonly<Record<string, OrSetState>>;
  readonly [field: string]: unknown;
}

/** An empty row, before any of its fields has arrived. */
export const emptyRow = (id: string): LocalRow => ({ id, _hlc: {} });

/**
 * Applies pulled values to a local row with the same per-field rule the server uses: a value
 * replaces the local one only when its clock is greater, so a pending local edit with a later
 * clock is never overwritten. Returns the same row object when nothing changed.
 *
 * @example
 * applyPulled({ id: 'r', _hlc: { title: '…:00002:a' }, title: 'Mine' }, [{ field: 'title', value: 'Old', hlc: '…:00001:b', … }])
 * // unchanged: the local title is newer
 */
export function applyPulled(row: LocalRow, changes: readonly Pick<PulledChange, 'field' | 'value' | 'hlc' | 'state'>[]): LocalRow {
  let next: Record<string, unknown> | null = null;
  let clocks: Record<string, string> | null = null;
  let sets: Record<string, OrSetState> | null = null;
  for (const change of changes) {
    if (change.state) {
      // A set field: join the states, so this device's unsynced adds and removes stay.
      const source = next ?? row;
      const current = { value: source[change.field], hlc: (clocks ?? row._hlc)[change.field], state: (sets ?? row._sets)?.[change.field] };
      const merged = mergeSetField(current, change);
      if (JSON.stringify(merged.state) === JSON.stringify(current.state) && merged.hlc === current.hlc) continue;
      next ??= { ...row };
      clocks ??= { ...row._hlc };
      sets ??= { ...row._sets };
      next[change.field] = merged.value;
      clocks[change.field] = merged.hlc;
      sets[change.field] = merged.state;
      continue;
    }
    const current = (clocks ?? row._hlc)[change.field];
    if (!wins(change.hlc, current, change.value, (next ?? row)[change.field])) continue;
    next ??= { ...row };
    clocks ??= { ...row._hlc };
    next[change.field] = change.value;
    clocks[change.field] = change.hlc;
  }
  if (!next) return row;
  return { ...next, id: row.id, _hlc: clocks!, ...(sets ? { _sets: sets } : {}) } as LocalRow;
}
