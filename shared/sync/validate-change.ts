import { parseHlc, MAX_CLOCK_AHEAD_MS } from './hlc';
import type { ChangeProblem } from '../api/sync';
import { setDeltaProblem } from './merge-set';
import { unstorableText } from './storable-text';
import { collectionSpec } from './schema/collections';
import { textChangeProblem } from '../text/text-change-problem';
import { textDocName } from '../text/text-doc';

/** Lower-case, as crypto.randomUUID() writes them and PostgreSQL returns them. */
const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/;

/**
 * What is wrong with one incoming change, or `null`. Checks the envelope (ids, clock), the
 * collection and field names, and the value's type and range — never the row's completeness,
 * because rows arrive in pieces.
 */
export function validateChange(change: unknown, index: number, nowMs: number): ChangeProblem | null {
  const problem = (code: string, reason: string, id?: string): ChangeProblem => ({ index, ...(id ? { id } : {}), code, reason });
  if (typeof change !== 'object' || change === null) return problem('invalid_change', 'must be an object');
  const { id, collection, rowId, field, value, hlc } = change as Record<string, unknown>;
  if (typeof id !== 'string' || !UUID.test(id)) return problem('invalid_change', 'id must be a lower-case UUID');
  if (typeof rowId !== 'string' || !UUID.test(rowId)) return problem('invalid_change', 'rowId must be a lower-case UUID', id);
  const spec = typeof collection === 'string' ? collectionSpec(collection) : undefined;
  if (!spec) return problem('unknown_collection', `collection ${String(collection)} does not exist`, id);
  const fieldSpec = typeof field === 'string' && Object.hasOwn(spec.fields, field) ? spec.fields[field as keyof typeof spec.fields] : undefined;
  if (!fieldSpec) return problem('unknown_field', `${spec.name} has no field ${String(field)}`, id);
  const clock = typeof hlc === 'string' ? parseHlc(hlc) : null;
  if (!clock) return problem('invalid_change', 'hlc must be a clock like 001764633600000:00000:<node>', id);
  if (clock.wall > nowMs + MAX_CLOCK_AHEAD_MS) {
    return problem('clock_ahead', 'hlc is more than 24 hours ahead of the server clock; check the device date', id);
  }
  if (fieldSpec.kind === 'text') {
    // A plain string (an older app's write) must be storable too; an update is checked as it decodes.
    const textProblem = unstorableText(value) ?? textChangeProblem(textDocName(spec.name, rowId, String(field)), fieldSpec, value);
    return textProblem ? problem('invalid_value', `${spec.name}.${String(field)} ${textProblem}`, id) : null;
  }
  const textProblem = unstorableText(value);
  if (textProblem) return problem('invalid_value', `${spec.name}.${String(field)} ${textProblem}`, id);
  if (fieldSpec.kind === 'set' && !Array.isArray(value)) {
    const setProblem = setDeltaProblem(value, fieldSpec.elements!, hlc as string);
    return setProblem ? problem('invalid_value', `${spec.name}.${String(field)} ${setProblem}`, id) : null;
  }
  const parsed = fieldSpec.schema.safeParse(value);
  if (!parsed.success) return problem('invalid_value', `${spec.name}.${String(field)} ${parsed.error.issues[0]?.message ?? 'is not valid'}`, id);
  return null;
}
