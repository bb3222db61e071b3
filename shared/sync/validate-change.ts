import type { ChangeProblem } from '../api/sync';
import { checkEnvelope, isProblem, type ChangeCollections } from './change-envelope';
import { setDeltaProblem } from './merge-set';
import { unstorableText } from './storable-text';
import { collectionSpec, fieldSpecOf } from './schema/collections';
import { textChangeProblem } from '../text/text-change-problem';
import { textDocName } from '../text/text-doc';

/** The reader's own collections, as the shared schema has them. */
const OWN_COLLECTIONS: ChangeCollections = { collection: collectionSpec, unknown: 'does not exist', field: fieldSpecOf };

/**
 * What is wrong with one incoming change, or `null`. Checks the envelope (ids, clock), the
 * collection and field names, and the value's type and range — never the row's completeness,
 * because rows arrive in pieces.
 */
export function validateChange(change: unknown, index: number, nowMs: number): ChangeProblem | null {
  const checked = checkEnvelope(change, index, nowMs, OWN_COLLECTIONS);
  if (isProblem(checked)) return checked;
  const { collection, rowId, field, fieldSpec, value, hlc, valueProblem } = checked;
  if (fieldSpec.kind === 'text') {
    // A plain string (an older app's write) must be storable too; an update is checked as it decodes.
    const textProblem = unstorableText(value) ?? textChangeProblem(textDocName(collection, rowId, field), fieldSpec, value);
    return textProblem ? valueProblem(textProblem) : null;
  }
  const textProblem = unstorableText(value);
  if (textProblem) return valueProblem(textProblem);
  if (fieldSpec.kind === 'set' && !Array.isArray(value)) {
    const setProblem = setDeltaProblem(value, fieldSpec.elements!, hlc);
    return setProblem ? valueProblem(setProblem) : null;
  }
  const parsed = fieldSpec.schema.safeParse(value);
  return parsed.success ? null : valueProblem(parsed.error.issues[0]?.message ?? 'is not valid');
}
