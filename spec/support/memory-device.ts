import { randomUUID } from 'node:crypto';

import type { ChangeProblem, FieldChange, PullResponse } from '../../shared/api/sync';
import { clockOffsetMs, restampClocks } from '../../shared/sync/device-clock';
import { HlcClock } from '../../shared/sync/hlc';
import { applyPulled, emptyRow, type LocalRow } from '../../shared/sync/local-row';
import { runSyncCycle, type PushOutcome, type QueuedChange, type SyncPorts } from '../../shared/sync/sync-cycle';

/**
 * A device that keeps its journal in memory and talks HTTP to a real server: the shared sync
 * cycle with the simplest honest storage, the way a command-line client would run it.
 */
export class MemoryDevice implements SyncPorts {
  readonly rows = new Map<string, LocalRow>();
  readonly outbox: QueuedChange[] = [];
  readonly setAsideChanges: { change: QueuedChange; problem: ChangeProblem }[] = [];
  private savedCursor: string | undefined;
  private seq = 0;
  private clock: HlcClock;
  /** Learnt from the server's answers: what to add to this device's own clock. */
  offsetMs = 0;
  /** The greatest clock seen from others. */
  private seen: string | null = null;

  /** `skewMs`: how wrong this device's date is (a device 3 days ahead has +3 days). */
  constructor(
    private readonly baseUrl: string,
    private readonly accessToken: string,
    readonly node: string = randomUUID(),
    private readonly skewMs = 0,
  ) {
    this.clock = new HlcClock(node, this.correctedNow);
  }

  private readonly correctedNow = () => Date.now() + this.skewMs + this.offsetMs;

  /** Learns the offset from an answer's server time (the body's, else the HTTP Date header). */
  private learn(res: Response, sentAt: number, body?: { serverTime?: string }): void {
    const serverTime = Date.parse(body?.serverTime ?? res.headers.get('date') ?? '');
    if (Number.isFinite(serverTime)) this.offsetMs = clockOffsetMs(serverTime, sentAt + this.skewMs, Date.now() + this.skewMs);
  }

  /** A local edit: the row and the outbox change together, as the app's store does. */
  write(collection: string, rowId: string, patch: Record<string, unknown>): void {
    const hlc = this.clock.tick();
    const key = `${collection}/${rowId}`;
    const row: Record<string, unknown> = { ...(this.rows.get(key) ?? emptyRow(rowId)) };
    const clocks: Record<string, string> = { ...(row['_hlc'] as Record<string, string>) };
    for (const [field, value] of Object.entries(patch)) {
      row[field] = value;
      clocks[field] = hlc;
      this.outbox.push({ id: randomUUID(), collection, rowId, field, value, hlc, seq: ++this.seq });
    }
    this.rows.set(key, { ...row, _hlc: clocks } as LocalRow);
  }

  sync(batchSize?: number) {
    return runSyncCycle(this, batchSize);
  }

  async nextBatch(limit: number) {
    return this.outbox.slice(0, limit);
  }
  async acknowledge(changes: readonly QueuedChange[]) {
    const done = new Set(changes.map((c) => c.seq));
    this.outbox.splice(0, this.outbox.length, ...this.outbox.filter((c) => !done.has(c.seq)));
  }
  async setAside(refused: readonly { change: QueuedChange; problem: ChangeProblem }[]) {
    this.setAsideChanges.push(...refused);
    await this.acknowledge(refused.map((r) => r.change));
  }
  async restamp(changes: readonly QueuedChange[]) {
    const renamed = restampClocks(
      changes.map((c) => c.hlc),
      this.node,
      this.correctedNow,
      this.seen,
    );
    const bySeq = new Set(changes.map((c) => c.seq));
    for (const [n, change] of this.outbox.entries()) if (bySeq.has(change.seq)) this.outbox[n] = { ...change, hlc: renamed.get(change.hlc)! };
    for (const [key, row] of this.rows) {
      const clocks = Object.fromEntries(Object.entries(row._hlc).map(([field, hlc]) => [field, renamed.get(hlc) ?? hlc]));
      this.rows.set(key, { ...row, _hlc: clocks });
    }
    this.clock = new HlcClock(this.node, this.correctedNow, [...renamed.values()].at(-1));
  }
  async push(changes: readonly FieldChange[]): Promise<PushOutcome> {
    const sentAt = Date.now();
    const res = await fetch(`${this.baseUrl}/api/sync/push`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', authorization: `Bearer ${this.accessToken}` },
      body: JSON.stringify({ deviceId: this.node, changes }),
    });
    if (res.status === 200) {
      this.learn(res, sentAt, (await res.json()) as { serverTime: string });
      return { kind: 'applied' };
    }
    this.learn(res, sentAt);
    if (res.status === 413) return { kind: 'too-large' };
    const body = (await res.json()) as { error: { details: ChangeProblem[] } };
    if (res.status === 400 && Array.isArray(body.error.details)) return { kind: 'refused', problems: body.error.details };
    throw new Error(`push answered ${res.status}`);
  }
  async cursor() {
    return this.savedCursor;
  }
  async pull(cursor: string | undefined): Promise<PullResponse> {
    const sentAt = Date.now();
    const res = await fetch(`${this.baseUrl}/api/sync/pull?${cursor ? `since=${cursor}&` : ''}limit=3`, {
      headers: { authorization: `Bearer ${this.accessToken}` },
    });
    const page = (await res.json()) as PullResponse;
    this.learn(res, sentAt, page);
    return page;
  }
  async apply(page: PullResponse) {
    for (const change of page.changes) {
      const key = `${change.collection}/${change.rowId}`;
      this.rows.set(key, applyPulled(this.rows.get(key) ?? emptyRow(change.rowId), [change]));
      this.clock.receive(change.hlc);
      if (!this.seen || change.hlc > this.seen) this.seen = change.hlc;
    }
    this.savedCursor = page.cursor;
  }
}
