import { HttpErrorResponse } from '@angular/common/http';

import { isApiErrorBody } from '@shared/api/api-error';

/** What went wrong with a request, in words for the reader, plus any per-field reasons. */
export interface ReadableError {
  readonly message: string;
  readonly fields: Readonly<Record<string, string>>;
  /** No answer at all: offline, or the server could not be reached. */
  readonly offline: boolean;
}

/**
 * Whether a failed request never reached our server: no network (status 0), or a gateway's
 * answer without our error body — the service worker answers 504 when the network is down.
 */
export function isUnreachable(error: unknown): boolean {
  if (!(error instanceof HttpErrorResponse)) return false;
  return error.status === 0 || ([502, 503, 504].includes(error.status) && !isApiErrorBody(error.error));
}

/**
 * Turns a failed request into a message the UI can show. Network failures are reported as being
 * offline (calmly: reading offline is normal here), never as the reader's fault.
 */
export function readableError(error: unknown): ReadableError {
  if (error instanceof HttpErrorResponse) {
    if (isUnreachable(error)) {
      return { message: 'You seem to be offline. Try again when you have a connection.', fields: {}, offline: true };
    }
    if (isApiErrorBody(error.error)) {
      const details = error.error.error.details;
      const fields = details && !Array.isArray(details) ? (details as Record<string, string>) : {};
      return { message: error.error.error.message, fields, offline: false };
    }
    if (error.status >= 500) {
      return { message: 'The server had a problem. Your work on this device is safe; try again later.', fields: {}, offline: false };
    }
  }
  return { message: 'Something went wrong. Try again.', fields: {}, offline: false };
}
