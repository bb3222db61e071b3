import { createParser, type EventSourceMessage } from 'eventsource-parser';

/**
 * A reader of `GET /api/sync/events` for Node (specs, benchmarks, chaos runs): fetch with the
 * bearer header, parsed by eventsource-parser, the same way the app reads it in the browser.
 */
export class SyncEventStream {
  readonly events: (EventSourceMessage & { at: number })[] = [];
  readonly comments: string[] = [];
  private waiters: (() => void)[] = [];
  ended = false;

  private constructor(
    readonly status: number,
    readonly headers: Headers,
    private readonly abort: AbortController,
  ) {}

  static async open(baseUrl: string, accessToken: string | null, options: { lastEventId?: string } = {}): Promise<SyncEventStream> {
    const abort = new AbortController();
    const headers: Record<string, string> = { accept: 'text/event-stream' };
    if (accessToken !== null) headers['authorization'] = `Bearer ${accessToken}`;
    if (options.lastEventId !== undefined) headers['last-event-id'] = options.lastEventId;
    const res = await fetch(`${baseUrl}/api/sync/events`, { headers, signal: abort.signal });
    const stream = new SyncEventStream(res.status, res.headers, abort);
    if (res.status !== 200 || !res.body) {
      await res.body?.cancel().catch(() => undefined);
      stream.ended = true;
      return stream;
    }
    const parser = createParser({
      onEvent: (event) => stream.record(() => stream.events.push({ ...event, at: performance.now() })),
      onComment: (comment) => stream.record(() => stream.comments.push(comment)),
    });
    void (async () => {
      const decoder = new TextDecoder();
      try {
        for await (const chunk of res.body as unknown as AsyncIterable<Uint8Array>) parser.feed(decoder.decode(chunk, { stream: true }));
      } catch {
        // aborted or the connection dropped
      }
      stream.record(() => (stream.ended = true));
    })();
    return stream;
  }

  /** The id of the last event received. */
  get lastEventId(): string | undefined {
    return this.events.at(-1)?.id;
  }

  /** Resolves when `predicate` holds (checked on every event, comment or end), or rejects after `timeoutMs`. */
  until(predicate: (stream: SyncEventStream) => boolean, timeoutMs = 5000): Promise<void> {
    if (predicate(this)) return Promise.resolve();
    return new Promise((resolve, reject) => {
      const timer = setTimeout(() => {
        this.waiters = this.waiters.filter((w) => w !== check);
        reject(new Error(`stream condition not met in ${timeoutMs} ms (${this.events.length} events, ${this.comments.length} comments)`));
      }, timeoutMs);
      const check = () => {
        if (!predicate(this)) return;
        clearTimeout(timer);
        this.waiters = this.waiters.filter((w) => w !== check);
        resolve();
      };
      this.waiters.push(check);
    });
  }

  /** Resolves with the first `sync` event after the first `count` events. */
  async nextSync(after: number, timeoutMs = 5000): Promise<EventSourceMessage & { at: number }> {
    await this.until((s) => s.events.slice(after).some((e) => e.event === 'sync'), timeoutMs);
    return this.events.slice(after).find((e) => e.event === 'sync')!;
  }

  close(): void {
    this.abort.abort();
  }

  private record(change: () => void): void {
    change();
    for (const waiter of [...this.waiters]) waiter();
  }
}
