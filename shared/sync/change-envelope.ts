import type { ChangeProblem } from '../api/sync';
import { MAX_CLOCK_AHEAD_MS, parseHlc } from './hlc';
import type { FieldSpec } from './schema/field';

/** Lower-case, as crypto.randomUUID() writes them and PostgreSQL returns them. */
const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/;

/** The collections a change may name: the reader's own, or a circle's. */
export interface ChangeCollections {
  collection(name: string): { readonly name: string } | undefined;
  /** Why a collection not found is refused ('does not exist'). */
  readonly unknown: string;
  field(collection: string, name: string): FieldSpec | undefined;
}

/** A change whose envelope is sound; its value is still to be checked. */
export interface EnvelopedChange {
  readonly id: string;
  readonly rowId: string;
  readonly collection: string;
  readonly field: string;
  readonly fieldSpec: FieldSpec;
  readonly value: unknown;
  readonly hlc: string;
  /** An `invalid_value` problem naming the change's collection and field. */
  valueProblem(reason: string): ChangeProblem;
}

/**
 * The checks every pushed change passes before its value is looked at: lower-case UUIDs for its
 * id and row, a collection and field that exist in `collections`, and a clock that parses and is
 * at most 24 hours ahead of the server's. Returns the first problem, or the change's parts.
 */
export function checkEnvelope(change: unknown, index: number, nowMs: number, collections: ChangeCollections): ChangeProblem | EnvelopedChange {
  const problem = (code: string, reason: string, id?: string): ChangeProblem => ({ index, ...(id ? { id } : {}), code, reason });
  if (typeof change !== 'object' || change === null) return problem('invalid_change', 'must be an object');
  const { id, collection, rowId, field, value, hlc } = change as Record<string, unknown>;
  if (typeof id !== 'string' || !UUID.test(id)) return problem('invalid_change', 'id must be a lower-case UUID');
  if (typeof rowId !== 'string' || !UUID.test(rowId)) return problem('invalid_change', 'rowId must be a lower-case UUID', id);
  const spec = typeof collection === 'string' ? collections.collection(collection) : undefined;
  if (!spec) return problem('unknown_collection', `collection ${String(collection)} ${collections.unknown}`, id);
  const fieldSpec = typeof field === 'string' ? collections.field(spec.name, field) : undefined;
  if (!fieldSpec) return problem('unknown_field', `${spec.name} has no field ${String(field)}`, id);
  const clock = typeof hlc === 'string' ? parseHlc(hlc) : null;
  if (!clock) return problem('invalid_change', 'hlc must be a clock like 001764633600000:00000:<node>', id);
  if (clock.wall > nowMs + MAX_CLOCK_AHEAD_MS) {
    return problem('clock_ahead', 'hlc is more than 24 hours ahead of the server clock; check the device date', id);
  }
  return {
    id,
    rowId,
    collection: spec.name,
    field: field as string,
    fieldSpec,
    value,
    hlc: hlc as string,
    valueProblem: (reason) => problem('invalid_value', `${spec.name}.${String(field)} ${reason}`, id),
  };
}

/** Whether `checkEnvelope` found a problem. */
export function isProblem(checked: ChangeProblem | EnvelopedChange): checked is ChangeProblem {
  return 'code' in checked;
}
