import pg from 'pg';
import type { DataSource } from 'typeorm';

import { COLLECTIONS } from '../../../shared/sync/schema/collections';

/** The PostgreSQL channel that carries "this reader's data changed" between server instances. */
export const SYNC_CHANNEL = 'lamplight_sync';

/** The part of a node-postgres client a push transaction hands over. */
interface TransactionClient {
  query(config: { text: string; values?: unknown[] }): Promise<unknown>;
}

/**
 * Queues a poke for every instance, inside the push's own transaction: PostgreSQL delivers a
 * NOTIFY only when its transaction commits (and drops it on rollback), so a poke can never
 * arrive before the change it announces is visible to a pull. The payload is the reader and the
 * sequence's last value, which is at least every sequence this transaction (and so the reader,
 * whose pushes take turns) has taken; it becomes the stream's event id.
 */
export async function notifyPushed(client: TransactionClient, userId: string): Promise<void> {
  await client.query({ text: `SELECT pg_notify('${SYNC_CHANNEL}', $1::text || ':' || (SELECT last_value FROM sync_seq))`, values: [userId] });
}

/** A notification's payload read back; `null` for anything that is not ours. */
export function parsePoke(payload: string | undefined): { userId: string; seq: number } | null {
  const match = /^([0-9a-f-]{36}):(\d{1,18})$/.exec(payload ?? '');
  return match ? { userId: match[1]!, seq: Number(match[2]) } : null;
}

const LATEST_SEQ_SQL = `SELECT greatest(${Object.values(COLLECTIONS)
  .map((spec) => `(SELECT max(seq) FROM ${spec.table} WHERE user_id = $1)`)
  .join(', ')}) AS seq`;

/** The greatest sequence of any of the reader's rows (0 when they have none). */
export async function latestSeq(dataSource: DataSource, userId: string): Promise<number> {
  const rows: { seq: string | null }[] = await dataSource.query(LATEST_SEQ_SQL, [userId]);
  return Number(rows[0]?.seq ?? 0);
}

type Poke = (seq: number | null) => void;

/**
 * One dedicated connection per server instance that LISTENs on {@link SYNC_CHANNEL} and hands
 * each poke to the streams of that reader open on this instance. It is a plain `pg.Client`, not
 * a pooled one (a pool would hand the session to others and lose the LISTEN), opened when the
 * first stream subscribes and closed a while after the last one leaves. If the connection
 * drops it reconnects with backoff and then pokes every stream, because notifications sent
 * meanwhile are lost.
 */
export class SyncListener {
  private readonly subscribers = new Map<string, Set<Poke>>();
  private client: pg.Client | null = null;
  private ready: Promise<void> | null = null;
  private idleTimer: ReturnType<typeof setTimeout> | undefined;
  private retryTimer: ReturnType<typeof setTimeout> | undefined;
  private failures = 0;
  private closed = false;

  constructor(
    private readonly databaseUrl: string,
    private readonly idleCloseMs = 30_000,
  ) {}

  /** Streams subscribed on this instance (for benchmarks and health). */
  get streamCount(): number {
    let count = 0;
    for (const set of this.subscribers.values()) count += set.size;
    return count;
  }

  /** How many of this reader's streams are open here. */
  streamsOf(userId: string): number {
    return this.subscribers.get(userId)?.size ?? 0;
  }

  /**
   * Registers `poke` for the reader's pokes and resolves once LISTEN is active, so anything
   * committed after that is announced; the caller reads the latest sequence after this resolves
   * to cover what committed before. Returns the unsubscribe function.
   */
  async subscribe(userId: string, poke: Poke): Promise<() => void> {
    clearTimeout(this.idleTimer);
    const set = this.subscribers.get(userId) ?? new Set<Poke>();
    this.subscribers.set(userId, set);
    set.add(poke);
    const unsubscribe = () => {
      set.delete(poke);
      if (set.size === 0 && this.subscribers.get(userId) === set) this.subscribers.delete(userId);
      if (this.subscribers.size === 0) this.scheduleIdleClose();
    };
    try {
      await this.connect();
    } catch (error) {
      unsubscribe();
      throw error;
    }
    return unsubscribe;
  }

  /** Closes the connection now (server shutdown). */
  async close(): Promise<void> {
    this.closed = true;
    clearTimeout(this.idleTimer);
    clearTimeout(this.retryTimer);
    await this.disconnect();
  }

  private connect(): Promise<void> {
    this.closed = false;
    this.ready ??= this.open().catch((error: unknown) => {
      this.ready = null;
      throw error;
    });
    return this.ready;
  }

  private async open(): Promise<void> {
    const client = new pg.Client({ connectionString: this.databaseUrl, application_name: 'lamplight-sync-listener', connectionTimeoutMillis: 5000 });
    client.on('notification', (message) => {
      const poke = parsePoke(message.payload);
      if (poke) for (const subscriber of this.subscribers.get(poke.userId) ?? []) subscriber(poke.seq);
    });
    // 'error' and 'end' both mean the session (and its LISTEN) is gone.
    const lost = () => this.connectionLost(client);
    client.on('error', lost);
    client.on('end', lost);
    this.client = client;
    try {
      await client.connect();
      await client.query(`LISTEN ${SYNC_CHANNEL}`);
    } catch (error) {
      this.client = null;
      client.removeAllListeners('end');
      await client.end().catch(() => undefined);
      throw error;
    }
    this.failures = 0;
  }

  private connectionLost(client: pg.Client): void {
    if (this.client !== client) return;
    this.client = null;
    this.ready = null;
    client.removeAllListeners('end');
    void client.end().catch(() => undefined);
    this.reconnectSoon();
  }

  private reconnectSoon(): void {
    if (this.closed || this.subscribers.size === 0) return;
    clearTimeout(this.retryTimer);
    const delay = Math.min(5000, 250 * 2 ** this.failures++);
    this.retryTimer = setTimeout(() => {
      this.connect().then(
        // Whatever was announced while we were away is lost: every stream here pulls once.
        () => this.subscribers.forEach((set) => set.forEach((subscriber) => subscriber(null))),
        () => this.reconnectSoon(),
      );
    }, delay);
    this.retryTimer.unref();
  }

  private scheduleIdleClose(): void {
    clearTimeout(this.idleTimer);
    this.idleTimer = setTimeout(() => {
      if (this.subscribers.size === 0) void this.disconnect();
    }, this.idleCloseMs);
    this.idleTimer.unref();
  }

  private async disconnect(): Promise<void> {
    const client = this.client;
    this.client = null;
    this.ready = null;
    if (!client) return;
    client.removeAllListeners('end');
    client.removeAllListeners('error');
    client.on('error', () => undefined);
    await client.end().catch(() => undefined);
  }
}
