/**
 * The body of every error the API answers with, whatever the route:
 * `{ "error": { "code", "message", "details" } }`. `details` names fields (or batch items) and
 * says what is wrong with each, so the UI can put the message beside the right input.
 */
export interface ApiErrorBody {
  readonly error: {
    readonly code: string;
    readonly message: string;
    readonly details: Readonly<Record<string, string>> | readonly object[] | null;
  };
}

/**
 * Whether a parsed response body is an API error (and not, say, a proxy's HTML page).
 *
 * @example
 * isApiErrorBody({ error: { code: 'not_found', message: 'No route', details: null } }) // true
 */
export function isApiErrorBody(body: unknown): body is ApiErrorBody {
  if (typeof body !== 'object' || body === null || !('error' in body)) return false;
  const error = (body as { error: unknown }).error;
  return (
    typeof error === 'object' &&
    error !== null &&
    typeof (error as { code?: unknown }).code === 'string' &&
    typeof (error as { message?: unknown }).message === 'string'
  );
}
