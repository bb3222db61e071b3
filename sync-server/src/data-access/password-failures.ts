import { createHash } from 'node:crypto';

import type { DataSource } from 'typeorm';

/** Wrong passwords allowed before any wait (OWASP Authentication Cheat Sheet: throttle, don't lock for good). */
export const FREE_FAILURES = 5;
/** The first wait; each further wrong password doubles it, up to the cap. */
const FIRST_WAIT_SECONDS = 30;
export const MAX_WAIT_SECONDS = 15 * 60;
/** A day without a wrong password forgets the earlier ones. */
const FORGET_AFTER_SECONDS = 24 * 3600;

/** Seconds to wait after the `failures`-th wrong password in a row (0 while still free). */
export function waitAfter(failures: number): number {
  if (failures < FREE_FAILURES) return 0;
  return Math.min(MAX_WAIT_SECONDS, FIRST_WAIT_SECONDS * 2 ** (failures - FREE_FAILURES));
}

/**
 * Wrong passwords per account (sign-in, keyed by e-mail) and per signed-in reader (password
 * change, account deletion, keyed by user id), kept in PostgreSQL so every instance sees them.
 * This is the per-account limit beside the per-address one: rotating addresses does not help.
 * Keys are SHA-256 digests, so the table holds no e-mail addresses.
 */
export class PasswordFailures {
  constructor(private readonly dataSource: DataSource) {}

  /** Seconds left before `key` may try a password again; 0 when it may now. */
  async secondsToWait(key: string): Promise<number> {
    const rows: { wait: number }[] = await this.dataSource.query(
      'SELECT ceil(extract(epoch FROM locked_until - now()))::int AS wait FROM password_failures WHERE key = $1 AND locked_until > now()',
      [digest(key)],
    );
    return rows[0]?.wait ?? 0;
  }

  /** Counts a wrong password and starts the wait it earns; answers that wait in seconds. */
  async fail(key: string): Promise<number> {
    const rows: { failures: number }[] = await this.dataSource.query(
      // Rows forgotten a day ago go as new failures come, so guesses at many addresses do not pile up.
      `WITH forgotten AS (DELETE FROM password_failures WHERE updated_at < now() - make_interval(secs => $2) AND key <> $1)
       INSERT INTO password_failures AS f (key, failures, updated_at) VALUES ($1, 1, now())
       ON CONFLICT (key) DO UPDATE SET
         failures = CASE WHEN f.updated_at < now() - make_interval(secs => $2) THEN 1 ELSE f.failures + 1 END,
         updated_at = now()
       RETURNING failures`,
      [digest(key), FORGET_AFTER_SECONDS],
    );
    const wait = waitAfter(rows[0]!.failures);
    if (wait > 0) {
      await this.dataSource.query('UPDATE password_failures SET locked_until = now() + make_interval(secs => $2) WHERE key = $1', [digest(key), wait]);
    }
    return wait;
  }

  /** A right password clears the count. */
  async succeed(key: string): Promise<void> {
    await this.dataSource.query('DELETE FROM password_failures WHERE key = $1', [digest(key)]);
  }
}

function digest(key: string): string {
  return createHash('sha256').update(`password:${key}`).digest('base64url');
}
