import type { ErrorRequestHandler, RequestHandler } from 'express';

import type { ApiErrorBody } from '../../shared/api/api-error';

/** Field-level problems, keyed by the field's path (for example `changes.3.value`). */
export type ErrorDetails = Record<string, string> | readonly object[];

/**
 * The one error type of the API. Route code throws it; the error middleware turns it into
 * `{ error: { code, message, details } }` with its HTTP status.
 */
export class AppError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly details?: ErrorDetails,
  ) {
    super(message);
    this.name = 'AppError';
  }
}

/** JSON 404 for any `/api` route nobody handled. */
export const apiNotFound: RequestHandler = (req, _res, next) => {
  next(new AppError(404, 'not_found', `No API route ${req.method} ${req.originalUrl}`));
};

/** Body-parser errors carry `type` and `status`; map the ones a client can cause. */
function fromBodyParser(err: { type?: string; status?: number }): AppError | null {
  if (err.type === 'entity.too.large') return new AppError(413, 'too_large', 'Request body is too large');
  if (err.type === 'entity.parse.failed') return new AppError(400, 'invalid_json', 'Request body is not valid JSON');
  return null;
}

/** Registered last: every error becomes a JSON answer; unexpected ones are logged, not leaked. */
export const errorHandler: ErrorRequestHandler = (err, _req, res, _next) => {
  const known = err instanceof AppError ? err : fromBodyParser(err as { type?: string });
  if (known) {
    const body: ApiErrorBody = { error: { code: known.code, message: known.message, details: known.details ?? null } };
    res.status(known.status).json(body);
    return;
  }
  console.error(err);
  const body: ApiErrorBody = { error: { code: 'internal', message: 'Something went wrong on the server', details: null } };
  res.status(500).json(body);
};
