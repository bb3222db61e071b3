import { randomUUID } from 'node:crypto';

import type { ChangeProblem, FieldChange, PullResponse } from '../../shared/sync/field-change';
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
  private readonly clock: HlcClock;

  constructor(
    private readonly baseUrl: string,
    private readonly accessToken: string,
    readonly node: string = randomUUID(),
  ) {
    this.clock = new HlcClock(node);
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
  async push(changes: readonly FieldChange[]): Promise<PushOutcome> {
    const res = await fetch(`${this.baseUrl}/api/sync/push`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', authorization: `Bearer ${this.accessToken}` },
      body: JSON.stringify({ deviceId: this.node, changes }),
    });
    if (res.status === 200) return { kind: 'applied' };
    if (res.status === 413) return { kind: 'too-large' };
    const body = (await res.json()) as { error: { details: ChangeProblem[] } };
    if (res.status === 400 && Array.isArray(body.error.details)) return { kind: 'refused', problems: body.error.details };
    throw new Error(`push answered ${res.status}`);
  }
  async cursor() {
    return this.savedCursor;
  }
  async pull(cursor: string | undefined): Promise<PullResponse> {
    const res = await fetch(`${this.baseUrl}/api/sync/pull?${cursor ? `since=${cursor}&` : ''}limit=3`, {
      headers: { authorization: `Bearer ${this.accessToken}` },
    });
    return (await res.json()) as PullResponse;
  }
  async apply(page: PullResponse) {
    for (const change of page.changes) {
      const key = `${change.collection}/${change.rowId}`;
      this.rows.set(key, applyPulled(this.rows.get(key) ?? emptyRow(change.rowId), [change]));
      this.clock.receive(change.hlc);
    }
    this.savedCursor = page.cursor;
  }
}
