import type { z } from 'zod';

import { AppError } from '../errors';

/**
 * Validates a request body (or query) with a shared zod schema. Bad input becomes one 400 that
 * names every field and what is wrong with it, e.g. `{ email: 'Enter an e-mail address…' }`.
 */
export function parseInput<Schema extends z.ZodType>(schema: Schema, input: unknown): z.infer<Schema> {
  const result = schema.safeParse(input ?? {});
  if (result.success) return result.data;
  const details: Record<string, string> = {};
  for (const issue of result.error.issues) {
    const key = issue.path.length > 0 ? issue.path.join('.') : 'body';
    details[key] ??= issue.message;
  }
  throw new AppError(400, 'invalid_input', 'Some fields need attention', details);
}
