import type { FieldSpec } from '../sync/schema/field';
import { textUpdateProblem } from './text-update-problem';
import { decodeTextBytes, isTextUpdateValue } from './text-value';

/**
 * What is wrong with a pushed value of a mergeable text field, judged without the stored state:
 * a Yjs update (`{ yjs }`) must be base64 and pass {@link textUpdateProblem}; a plain string or
 * null (from an app that predates mergeable texts) must fit the field like any text. The
 * server checks the rest (fits the stored state, final length) when it merges.
 */
export function textChangeProblem(name: string, spec: FieldSpec, value: unknown): string | null {
  if (!isTextUpdateValue(value)) {
    const parsed = spec.schema.safeParse(value);
    return parsed.success ? null : (parsed.error.issues[0]?.message ?? 'is not valid');
  }
  const bytes = decodeTextBytes(value.yjs);
  if (!bytes) return 'yjs must be a base64 Yjs update';
  const problem = textUpdateProblem(name, bytes);
  return problem ? `update ${problem}` : null;
}
