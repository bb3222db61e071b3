import type { RequestParamHandler } from 'express';
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

/** The form PostgreSQL's `uuid` type prints, which is the only form our ids take. */
const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/**
 * For `router.param`: an id that cannot be a uuid cannot name anything, so it is a 404 (the
 * same answer as an unknown id), before any query that would choke on it.
 */
export function uuidParam(notFoundMessage: string): RequestParamHandler {
  return (_req, _res, next, value: unknown) => {
    next(typeof value === 'string' && UUID.test(value) ? undefined : new AppError(404, 'not_found', notFoundMessage));
  };
}
