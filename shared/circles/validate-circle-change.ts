import type { ChangeProblem } from '../api/sync';
import { MAX_CLOCK_AHEAD_MS, parseHlc } from '../sync/hlc';
import { unstorableText } from '../sync/storable-text';
import { circleCollectionSpec, circleFieldSpec } from './circle-collections';

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/;

/**
 * What is wrong with one change pushed to a circle, or `null`: the same envelope and value checks
 * as a reader's own changes (shared/sync/validate-change.ts), against the circle collections.
 * Who may write it is a separate question (circle-permissions.ts), answered with the row in hand.
 */
export function validateCircleChange(change: unknown, index: number, nowMs: number): ChangeProblem | null {
  const problem = (code: string, reason: string, id?: string): ChangeProblem => ({ index, ...(id ? { id } : {}), code, reason });
  if (typeof change !== 'object' || change === null) return problem('invalid_change', 'must be an object');
  const { id, collection, rowId, field, value, hlc } = change as Record<string, unknown>;
  if (typeof id !== 'string' || !UUID.test(id)) return problem('invalid_change', 'id must be a lower-case UUID');
  if (typeof rowId !== 'string' || !UUID.test(rowId)) return problem('invalid_change', 'rowId must be a lower-case UUID', id);
  const spec = typeof collection === 'string' ? circleCollectionSpec(collection) : undefined;
  if (!spec) return problem('unknown_collection', `collection ${String(collection)} is not a circle collection`, id);
  const fieldSpec = typeof field === 'string' ? circleFieldSpec(spec.name, field) : undefined;
  if (!fieldSpec) return problem('unknown_field', `${spec.name} has no field ${String(field)}`, id);
  const clock = typeof hlc === 'string' ? parseHlc(hlc) : null;
  if (!clock) return problem('invalid_change', 'hlc must be a clock like 001764633600000:00000:<node>', id);
  if (clock.wall > nowMs + MAX_CLOCK_AHEAD_MS) return problem('clock_ahead', 'hlc is more than 24 hours ahead of the server clock; check the device date', id);
  const textProblem = unstorableText(value);
  if (textProblem) return problem('invalid_value', `${spec.name}.${String(field)} ${textProblem}`, id);
  const parsed = fieldSpec.schema.safeParse(value);
  if (!parsed.success) return problem('invalid_value', `${spec.name}.${String(field)} ${parsed.error.issues[0]?.message ?? 'is not valid'}`, id);
  return null;
}
