import type { CollectionSpec } from './schema/collection';
import type { FieldSpec } from './schema/field';
import { unstorableText } from './storable-text';
import { isTextUpdateValue } from '../text/text-value';

/**
 * What is wrong with each field of a local edit, by field name; empty when it may be written.
 * The same validators the server applies to pushed changes.
 *
 * @example
 * validatePatch(books, { rating: 4.25 }) // { rating: 'must be in steps of 0.5' }
 */
export function validatePatch(spec: CollectionSpec, patch: Readonly<Record<string, unknown>>): Record<string, string> {
  const fields: Readonly<Record<string, FieldSpec>> = spec.fields;
  const problems: Record<string, string> = {};
  for (const [name, value] of Object.entries(patch)) {
    const field = Object.hasOwn(fields, name) ? fields[name] : undefined;
    if (!field) {
      problems[name] = 'is not a field of this collection';
      continue;
    }
    // A Yjs update from an editor is checked when it is applied (shared/text/local-text.ts).
    if (field.kind === 'text' && isTextUpdateValue(value)) continue;
    const parsed = field.schema.safeParse(value);
    if (!parsed.success) problems[name] = parsed.error.issues[0]?.message ?? 'is not valid';
    else {
      const textProblem = unstorableText(value);
      if (textProblem) problems[name] = textProblem;
    }
  }
  return problems;
}
