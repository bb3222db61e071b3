import { createHash } from 'node:crypto';

import type { IncrementResponse, Options, Store } from 'express-rate-limit';
import type { DataSource } from 'typeorm';

/**
 * An `express-rate-limit` store in our PostgreSQL, so every server instance behind a load
 * balancer counts the same attempts (the default memory store counts per process). The
 * published PostgreSQL stores run migrations of their own and pin another `pg`; this one is a
 * single table from our TypeORM migrations (`attempt_counts`).
 *
 * Keys are SHA-256 digests: a client's address is personal data, and the count needs only to
 * tell clients apart. Rows live for one window; expired ones are removed as new attempts come.
 */
export class PostgresAttemptStore implements Store {
  /** Counts are shared across instances, which is the point. */
  readonly localKeys = false;
  private windowMs = 15 * 60 * 1000;

  constructor(
    private readonly dataSource: DataSource,
    readonly prefix = 'auth',
  ) {}

  init(options: Options): void {
    this.windowMs = options.windowMs;
  }

  async increment(key: string): Promise<IncrementResponse> {
    // One statement, so two instances counting the same client at once both add their hit.
    const rows: { hits: number; reset_at: Date }[] = await this.dataSource.query(
      `WITH expired AS (DELETE FROM attempt_counts WHERE reset_at <= now() AND key <> $1)
       INSERT INTO attempt_counts AS counts (key, hits, reset_at)
       VALUES ($1, 1, now() + $2 * interval '1 millisecond')
       ON CONFLICT (key) DO UPDATE SET
         hits = CASE WHEN counts.reset_at <= now() THEN 1 ELSE counts.hits + 1 END,
         reset_at = CASE WHEN counts.reset_at <= now() THEN excluded.reset_at ELSE counts.reset_at END
       RETURNING hits, reset_at`,
      [this.digest(key), this.windowMs],
    );
    return { totalHits: rows[0]!.hits, resetTime: new Date(rows[0]!.reset_at) };
  }

  async decrement(key: string): Promise<void> {
    await this.dataSource.query('UPDATE attempt_counts SET hits = GREATEST(hits - 1, 0) WHERE key = $1 AND reset_at > now()', [this.digest(key)]);
  }

  async resetKey(key: string): Promise<void> {
    await this.dataSource.query('DELETE FROM attempt_counts WHERE key = $1', [this.digest(key)]);
  }

  private digest(key: string): string {
    return createHash('sha256').update(`${this.prefix}:${key}`).digest('base64url');
  }
}
