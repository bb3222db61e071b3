import { createHash } from 'node:crypto';

import type { IncrementResponse, Options, Store } from 'express-rate-limit';
import type { DataSource } from 'typeorm';

/** Expired rows are cleared this often, not on every request. */
const SWEEP_EVERY_MS = 60_000;

/**
 * An `express-rate-limit` store for limits on hot routes (sync): counts in memory and adds this
 * instance's hits to the shared `attempt_counts` row once per `flushMs` in one statement for all
 * keys, learning the other instances' hits from the same answer. A request therefore costs no
 * database write; across instances the count lags by at most `flushMs` after a key's first new
 * hit here (an instance learns others' hits when it sends its own), which a limit of
 * hundreds a minute does not notice. Within one instance it is exact. Keys are SHA-256 digests
 * like `PostgresAttemptStore`'s, in their own prefix.
 */
export class BatchedCountStore implements Store {
  readonly localKeys = false;
  private windowMs = 60_000;
  /** Hits not yet added to the shared row. */
  private readonly pending = new Map<string, number>();
  /** Hits on their way to the shared row (counted until its answer arrives). */
  private sending = new Map<string, number>();
  /** The shared count as of the last flush (this instance's flushed hits included). */
  private readonly shared = new Map<string, { hits: number; resetAt: number }>();
  private flushing: Promise<void> | null = null;
  private lastSweep = 0;
  private readonly timer: NodeJS.Timeout;

  constructor(
    private readonly dataSource: DataSource,
    readonly prefix: string,
    flushMs = 1000,
  ) {
    this.timer = setInterval(() => void this.flush().catch(() => undefined), flushMs).unref();
  }

  init(options: Options): void {
    this.windowMs = options.windowMs;
  }

  async increment(key: string): Promise<IncrementResponse> {
    const digest = this.digest(key);
    const now = Date.now();
    let known = this.shared.get(digest);
    if (!known || known.resetAt <= now) {
      // A new window: what was counted before it no longer matters.
      known = { hits: 0, resetAt: now + this.windowMs };
      this.shared.set(digest, known);
      if (this.pending.has(digest)) this.pending.set(digest, 0);
    }
    const pending = (this.pending.get(digest) ?? 0) + 1;
    this.pending.set(digest, pending);
    return { totalHits: known.hits + (this.sending.get(digest) ?? 0) + pending, resetTime: new Date(known.resetAt) };
  }

  async decrement(key: string): Promise<void> {
    const digest = this.digest(key);
    this.pending.set(digest, (this.pending.get(digest) ?? 0) - 1);
  }

  async resetKey(key: string): Promise<void> {
    const digest = this.digest(key);
    this.pending.delete(digest);
    this.shared.delete(digest);
    await this.dataSource.query('DELETE FROM attempt_counts WHERE key = $1', [digest]);
  }

  /** Sends the hits counted since the last flush and learns the shared totals; one statement. */
  flush(): Promise<void> {
    this.flushing ??= this.send().finally(() => (this.flushing = null));
    return this.flushing;
  }

  /** Stops the flush timer (the app's life is the process's; specs stop theirs). */
  stop(): void {
    clearInterval(this.timer);
  }

  private async send(): Promise<void> {
    const batch = [...this.pending].filter(([, hits]) => hits !== 0);
    this.pending.clear();
    if (batch.length === 0) return;
    this.sending = new Map(batch);
    try {
      const now = Date.now();
      if (now - this.lastSweep > SWEEP_EVERY_MS) {
        this.lastSweep = now;
        await this.dataSource.query(`DELETE FROM attempt_counts WHERE reset_at <= now() AND key LIKE $1`, [`${this.prefix}.%`]);
      }
      const rows: { key: string; hits: number; reset_at: Date }[] = await this.dataSource.query(
        `INSERT INTO attempt_counts AS counts (key, hits, reset_at)
         SELECT key, greatest(hits, 0), now() + $3 * interval '1 millisecond' FROM unnest($1::text[], $2::int[]) AS b(key, hits)
         ON CONFLICT (key) DO UPDATE SET
           hits = CASE WHEN counts.reset_at <= now() THEN excluded.hits ELSE greatest(counts.hits + excluded.hits, 0) END,
           reset_at = CASE WHEN counts.reset_at <= now() THEN excluded.reset_at ELSE counts.reset_at END
         RETURNING key, hits, reset_at`,
        [batch.map(([key]) => key), batch.map(([, hits]) => hits), this.windowMs],
      );
      for (const row of rows) this.shared.set(row.key, { hits: row.hits, resetAt: new Date(row.reset_at).getTime() });
    } catch (error) {
      // Not lost: counted again at the next flush.
      for (const [key, hits] of batch) this.pending.set(key, (this.pending.get(key) ?? 0) + hits);
      throw error;
    } finally {
      this.sending = new Map();
    }
  }

  private digest(key: string): string {
    return `${this.prefix}.${createHash('sha256').update(`${this.prefix}:${key}`).digest('base64url')}`;
  }
}
