import type { ChangeProblem } from '../api/sync';
import { checkEnvelope, isProblem, type ChangeCollections } from '../sync/change-envelope';
import { unstorableText } from '../sync/storable-text';
import { circleCollectionSpec, circleFieldSpec } from './circle-collections';

const CIRCLE_COLLECTIONS: ChangeCollections = { collection: circleCollectionSpec, unknown: 'is not a circle collection', field: circleFieldSpec };

/**
 * What is wrong with one change pushed to a circle, or `null`: the same envelope and value checks
 * as a reader's own changes (shared/sync/validate-change.ts), against the circle collections.
 * Who may write it is a separate question (circle-permissions.ts), answered with the row in hand.
 */
export function validateCircleChange(change: unknown, index: number, nowMs: number): ChangeProblem | null {
  const checked = checkEnvelope(change, index, nowMs, CIRCLE_COLLECTIONS);
  if (isProblem(checked)) return checked;
  const textProblem = unstorableText(checked.value);
  if (textProblem) return checked.valueProblem(textProblem);
  const parsed = checked.fieldSpec.schema.safeParse(checked.value);
  return parsed.success ? null : checked.valueProblem(parsed.error.issues[0]?.message ?? 'is not valid');
}
