import type { ErrorRequestHandler, RequestHandler } from 'express';

import type { ApiErrorBody } from '../../shared/api/api-error';
import { logServerError } from './safe-log';

/** Field-level problems, keyed by the field's path (for example `changes.3.value`). */
export type ErrorDetails = Record<string, string> | readonly object[];

/**
 * The one error type of the API. Route code throws it; the error middleware turns it into
 * `{ error: { code, message, details } }` with its HTTP status (and headers such as Retry-After).
 */
export class AppError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly details?: ErrorDetails,
    readonly headers?: Readonly<Record<string, string>>,
  ) {
    super(message);
    this.name = 'AppError';
  }
}

/** JSON 404 for any `/api` route nobody handled. */
export const apiNotFound: RequestHandler = (req, _res, next) => {
  next(new AppError(404, 'not_found', `No API route ${req.method} ${req.originalUrl.split('?')[0]}`));
};

/** What body-parser (and raw-body under it) reports for bodies a client got wrong. */
const BODY_ERRORS: Record<string, [status: number, code: string, message: string]> = {
  'entity.too.large': [413, 'too_large', 'Request body is too large'],
  'entity.parse.failed': [400, 'invalid_json', 'Request body is not valid JSON'],
  'encoding.unsupported': [415, 'unsupported_encoding', 'Send the body as identity, gzip, deflate or br'],
  'charset.unsupported': [415, 'unsupported_charset', 'Send the body as UTF-8'],
  'request.aborted': [400, 'request_aborted', 'The request body was cut short'],
  'request.size.invalid': [400, 'invalid_body', 'The request body does not match its Content-Length'],
  'parameters.too.many': [413, 'too_large', 'The request has too many parameters'],
};

/**
 * Body-parser errors carry `type` and `status`. A body declared gzip that is not arrives as a
 * zlib error (a `Z_…` code, wrapped with status 400); it is the client's, so it is a 400 too.
 */
function fromBodyParser(err: { type?: unknown; status?: unknown; code?: unknown }): AppError | null {
  const known = typeof err.type === 'string' ? BODY_ERRORS[err.type] : undefined;
  if (known) return new AppError(...known);
  if (typeof err.code === 'string' && /^Z_/.test(err.code)) {
    return new AppError(400, 'invalid_encoding', 'The request body is not in the encoding it declares');
  }
  if (typeof err.status === 'number' && err.status >= 400 && err.status < 500 && typeof err.type === 'string') {
    return new AppError(err.status, 'invalid_body', 'The request body cannot be read');
  }
  return null;
}

/** Registered last: every error becomes a JSON answer; unexpected ones are logged (safely), not leaked. */
export const errorHandler: ErrorRequestHandler = (err, req, res, _next) => {
  const known = err instanceof AppError ? err : fromBodyParser(err as object);
  if (known) {
    const body: ApiErrorBody = { error: { code: known.code, message: known.message, details: known.details ?? null } };
    if (known.headers) res.set(known.headers);
    res.status(known.status).json(body);
    return;
  }
  const caller = res.locals['caller'] as { userId?: string } | undefined;
  // The path holds ids only; the query string and body are never logged.
  logServerError(err, { method: req.method, path: req.originalUrl.split('?')[0]!.slice(0, 200), user: caller?.userId });
  const body: ApiErrorBody = { error: { code: 'internal', message: 'Something went wrong on the server', details: null } };
  res.status(500).json(body);
};
