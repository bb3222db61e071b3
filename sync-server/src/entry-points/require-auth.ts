import type { NextFunction, Request, RequestHandler, Response } from 'express';
import type { DataSource } from 'typeorm';

import type { Role } from '../data-access/entities/user.entity';
import { AppError } from '../errors';
import { VerifiedTokens } from '../domain/access-tokens';
import { SessionChecks, type SessionState } from '../domain/session-checks';

/** Who is calling, once `requireAuth` has let a request through. */
export interface Caller {
  readonly userId: string;
  readonly sessionId: string;
  readonly role: Role;
}

/** Last-seen times are refreshed at most this often, not on every request. */
const LAST_SEEN_RESOLUTION_MS = 60_000;

export function callerOf(res: Response): Caller {
  const caller = res.locals['caller'] as Caller | undefined;
  if (!caller) throw new AppError(401, 'unauthenticated', 'Sign in to continue');
  return caller;
}

/**
 * Bearer-token check for everything under /api except auth and health. Besides the token, the
 * device session must still be live and the account enabled, so sign-out, a lost-tablet revoke
 * or an admin's disable takes effect at once on the instance that did it and within
 * `sessionTtlMs` on the others, rather than when the token expires. Token signatures and session
 * rows are remembered briefly (`VerifiedTokens`, `SessionChecks`): while a reader's session is
 * remembered, a request costs no database read for the caller, and one prepared read otherwise.
 */
export function requireAuth(dataSource: DataSource, jwtSecret: Uint8Array, sessionTtlMs: number, options: { namedStatements?: boolean } = {}): RequestHandler {
  const tokens = new VerifiedTokens(jwtSecret);
  const read = sessionReader(dataSource, options.namedStatements !== false);
  const sessions = new SessionChecks(sessionTtlMs);
  return async (req: Request, res: Response, next: NextFunction) => {
    const header = req.get('authorization') ?? '';
    const match = /^Bearer ([A-Za-z0-9_\-.]+)$/.exec(header);
    if (!match) throw new AppError(401, 'unauthenticated', 'Sign in to continue');
    const verified = await tokens.verify(match[1]!);
    if (!verified.ok) {
      throw verified.reason === 'expired'
        ? new AppError(401, 'token_expired', 'The access token has expired; refresh it')
        : new AppError(401, 'invalid_token', 'The access token is not valid');
    }
    const { userId, sessionId } = verified.claims;
    const state = sessions.get(sessionId) ?? (await readSession(dataSource, read, sessions, sessionId, userId));
    if (state.userId !== userId || state.revoked) throw new AppError(401, 'session_revoked', 'This device was signed out; sign in again');
    if (state.disabled) throw new AppError(403, 'account_disabled', 'This account is disabled');
    res.locals['caller'] = { userId, sessionId, role: state.role } satisfies Caller;
    next();
  };
}

type SessionRow = { role: Role; disabled: boolean; revoked: boolean; stale: boolean };

/**
 * The session check's read, straight on the pool and prepared once per connection (unnamed behind
 * a transaction pooler, as the sync store's reads): with many readers, each instance's short
 * memory of sessions misses on most requests (bench:load), so this runs about as often as the pull.
 */
function sessionReader(dataSource: DataSource, named: boolean): (sessionId: string, userId: string) => Promise<SessionRow[]> {
  const statement = {
    ...(named ? { name: 'lamplight_session_check' } : {}),
    text: `SELECT u.role, u.disabled_at IS NOT NULL AS disabled, s.revoked_at IS NOT NULL AS revoked,
                  s.last_seen_at < now() - make_interval(secs => $3) AS stale
             FROM device_sessions s JOIN users u ON u.id = s.user_id
            WHERE s.id = $1 AND u.id = $2`,
  };
  return async (sessionId, userId) => {
    const pool = (dataSource.driver as unknown as { master: { query(config: object): Promise<{ rows: SessionRow[] }> } }).master;
    return (await pool.query({ ...statement, values: [sessionId, userId, LAST_SEEN_RESOLUTION_MS / 1000] })).rows;
  };
}

/** Reads a session and its account, refreshes last-seen times when stale, and remembers the answer. */
async function readSession(
  dataSource: DataSource,
  read: (sessionId: string, userId: string) => Promise<SessionRow[]>,
  sessions: SessionChecks,
  sessionId: string,
  userId: string,
): Promise<SessionState> {
  const rows = await read(sessionId, userId);
  const row = rows[0];
  const state: SessionState = row
    ? { userId, role: row.role, disabled: row.disabled, revoked: row.revoked }
    : { userId, role: 'reader', disabled: false, revoked: true };
  if (row?.stale && !row.revoked && !row.disabled) {
    await dataSource.query(
      `WITH s AS (UPDATE device_sessions SET last_seen_at = now() WHERE id = $1 RETURNING user_id)
       UPDATE users SET last_seen_at = now() WHERE id = (SELECT user_id FROM s)`,
      [sessionId],
    );
  }
  sessions.remember(sessionId, state);
  return state;
}

/** Admin routes: the role is read from the database by `requireAuth`, not trusted from the token. */
export const requireAdmin: RequestHandler = (_req, res, next) => {
  if (callerOf(res).role !== 'admin') throw new AppError(403, 'forbidden', 'Only admins may do this');
  next();
};
