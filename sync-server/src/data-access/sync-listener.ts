import pg from 'pg';

import { parsePoke, SYNC_CHANNEL } from './sync-notifications';

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
