/**
 * What the server writes about an unexpected error. A PostgreSQL error's message, detail, query
 * and parameters can hold a reader's own words (a journal entry, a title), so for those only the
 * SQLSTATE code and the names of the table, column and constraint are written (OWASP Logging
 * Cheat Sheet: never log personal data or sensitive content). Other errors keep their stack.
 */
export function describeError(err: unknown): string {
  const database = databaseErrorOf(err);
  if (database) {
    const where = (['table', 'column', 'constraint', 'routine'] as const)
      .filter((key) => typeof database[key] === 'string')
      .map((key) => `${key}=${String(database[key])}`);
    return `database error ${database.code}${where.length > 0 ? ` (${where.join(', ')})` : ''}`;
  }
  if (err instanceof Error) return err.stack ?? `${err.name}: ${err.message}`;
  return `non-error thrown: ${typeof err}`;
}

/** Logs an unexpected error with ids (request route, caller) and no values. */
export function logServerError(err: unknown, context: Record<string, string | undefined> = {}): void {
  const ids = Object.entries(context)
    .filter(([, value]) => value !== undefined)
    .map(([key, value]) => `${key}=${value}`)
    .join(' ');
  console.error(`server error${ids ? ` [${ids}]` : ''}: ${describeError(err)}`);
}

/**
 * A security event worth an operator's eye (OWASP Logging Cheat Sheet: authentication and
 * session-management failures), named and with ids only: never an address, password or token.
 */
export function logSecurityEvent(event: string, ids: Record<string, string | number | undefined> = {}): void {
  const fields = Object.entries(ids)
    .filter(([, value]) => value !== undefined)
    .map(([key, value]) => `${key}=${value}`);
  console.warn(`security: ${event}${fields.length > 0 ? ` [${fields.join(' ')}]` : ''}`);
}

interface DatabaseFields {
  readonly code: string;
  readonly table?: unknown;
  readonly column?: unknown;
  readonly constraint?: unknown;
  readonly routine?: unknown;
}

/** TypeORM's QueryFailedError wraps pg's DatabaseError as `driverError`; pg's has a 5-character SQLSTATE. */
function databaseErrorOf(err: unknown): DatabaseFields | null {
  if (typeof err !== 'object' || err === null) return null;
  const candidate = (err as { driverError?: unknown }).driverError ?? err;
  const code = (candidate as { code?: unknown }).code;
  const fromDatabase = (err as { name?: unknown }).name === 'QueryFailedError' || (candidate as { severity?: unknown }).severity !== undefined;
  if (!fromDatabase || typeof code !== 'string' || !/^[0-9A-Z]{5}$/.test(code)) return null;
  return candidate as DatabaseFields;
}
