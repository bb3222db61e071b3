import { MAX_CLOCK_AHEAD_MS, parseHlc } from '../sync/hlc';
import { emptyRow, type LocalRow } from '../sync/local-row';
import { wins } from '../sync/merge';
import { currentSetState, mergeSetField } from '../sync/merge-set';
import { isEmptyOrSet, orSetDelta } from '../sync/or-set';
import { fieldSpecOf, type CollectionName } from '../sync/schema/collections';

/** What importing one row did. */
export type ImportOutcome = 'added' | 'updated' | 'unchanged' | 'refused';

/** A change for the outbox (its id is added by the caller). */
export interface ImportedChange {
  readonly collection: CollectionName;
  readonly rowId: string;
  readonly field: string;
  readonly value: unknown;
  readonly hlc: string;
}

/**
 * Writes a mergeable text's new value into a row (see `shared/text/local-text.ts`): the row's
 * new field values and the outbox value, or a reason. Passed in so Yjs loads only when needed.
 */
export type TextImporter = (
  collection: CollectionName,
  row: LocalRow,
  field: string,
  value: string | null,
) => { row: Record<string, unknown>; value: unknown } | { problem: string };

export interface RowImport {
  readonly outcome: ImportOutcome;
  /** The row to store when something changed. */
  readonly row?: LocalRow;
  readonly changes: readonly ImportedChange[];
  readonly reason?: string;
}

const isObject = (value: unknown): value is Record<string, unknown> => typeof value === 'object' && value !== null && !Array.isArray(value);

/** Why a row of the file cannot be imported, or null. Every field is checked before any is taken. */
function rowProblem(collection: CollectionName, fileRow: unknown, nowMs: number): string | null {
  if (!isObject(fileRow) || typeof fileRow['id'] !== 'string' || !/^[A-Za-z0-9-]{1,64}$/.test(fileRow['id'])) return 'has no valid id';
  const { fields, clocks } = fileRow;
  if (!isObject(fields) || !isObject(clocks)) return 'has no fields or clocks';
  for (const [name, value] of Object.entries(fields)) {
    const spec = fieldSpecOf(collection, name);
    if (!spec) return `${name} is not a field of ${collection}`;
    const checked = spec.schema.safeParse(value);
    if (!checked.success) return `${name} ${checked.error.issues[0]?.message ?? 'is not valid'}`;
    const clock = typeof clocks[name] === 'string' ? parseHlc(clocks[name]) : null;
    if (!clock) return `${name} has no valid clock`;
    if (clock.wall > nowMs + MAX_CLOCK_AHEAD_MS) return `${name} has a clock more than a day in the future`;
  }
  return null;
}

/**
 * Merges one row of an export into the device's copy with the same per-field rule as sync: a
 * field is taken only when the file's clock wins over the device's (so nothing newer here is
 * overwritten), keeping the file's clock, so importing the same file twice changes nothing.
 */
export function importRow(collection: CollectionName, fileRow: unknown, local: LocalRow | undefined, nowMs: number, texts?: TextImporter): RowImport {
  const problem = rowProblem(collection, fileRow, nowMs);
  if (problem) return { outcome: 'refused', changes: [], reason: problem };
  const { id, fields, clocks } = fileRow as { id: string; fields: Record<string, unknown>; clocks: Record<string, string> };
  const start = local ?? emptyRow(id);
  let next: Record<string, unknown> = { ...start, _hlc: { ...start._hlc } };
  const changes: ImportedChange[] = [];
  for (const [field, value] of Object.entries(fields)) {
    const hlc = clocks[field]!;
    const current = next as LocalRow;
    if (!wins(hlc, current._hlc[field], value, current[field])) continue;
    const kind = fieldSpecOf(collection, field)!.kind;
    let pushed: unknown = value;
    if (kind === 'set') {
      const stamped = { value: current[field], hlc: current._hlc[field], state: current._sets?.[field] };
      const delta = orSetDelta(currentSetState(stamped), value as string[], hlc);
      const merged = mergeSetField(stamped, { value: delta, hlc });
      if (isEmptyOrSet(delta) && merged.hlc === stamped.hlc) continue;
      next = { ...next, [field]: merged.value, _sets: { ...current._sets, [field]: merged.state } };
      pushed = delta;
    } else if (kind === 'text' && texts) {
      const written = texts(collection, current, field, value as string | null);
      if ('problem' in written) return { outcome: 'refused', changes: [], reason: `${field} ${written.problem}` };
      next = { ...next, ...written.row };
      pushed = written.value;
    } else {
      next[field] = value;
    }
    (next['_hlc'] as Record<string, string>)[field] = hlc;
    changes.push({ collection, rowId: id, field, value: pushed, hlc });
  }
  if (changes.length === 0) return { outcome: 'unchanged', changes };
  return { outcome: local ? 'updated' : 'added', row: next as LocalRow, changes };
}
