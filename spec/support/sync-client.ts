import { randomUUID } from 'node:crypto';

import type { FieldChange, PullResponse, PushResponse } from '../../shared/api/sync';
import { formatHlc } from '../../shared/sync/hlc';
import { mergeChanges, type FieldState } from '../../shared/sync/merge-changes';

/** A change with a fresh id and a clock built from its parts. */
export function fieldChange(
  rowId: string,
  field: string,
  value: unknown,
  clock: { wall: number; counter?: number; node?: string },
  collection = 'books',
): FieldChange {
  return {
    id: randomUUID(),
    collection,
    rowId,
    field,
    value,
    hlc: formatHlc({ wall: clock.wall, counter: clock.counter ?? 0, node: clock.node ?? 'device-a' }),
  };
}

/** A minimal sync client over HTTP (fetch), the way any device talks to any server instance. */
export class SyncClient {
  constructor(
    private readonly baseUrl: string,
    private readonly accessToken: string,
    readonly deviceId: string = randomUUID(),
  ) {}

  async push(changes: readonly FieldChange[]): Promise<{ status: number; body: PushResponse & { error?: { code: string; details: unknown } } }> {
    const res = await fetch(`${this.baseUrl}/api/sync/push`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', authorization: `Bearer ${this.accessToken}` },
      body: JSON.stringify({ deviceId: this.deviceId, changes }),
    });
    return { status: res.status, body: await res.json() };
  }

  async pull(since?: string, limit?: number): Promise<PullResponse> {
    const params = new URLSearchParams();
    if (since !== undefined) params.set('since', since);
    if (limit !== undefined) params.set('limit', String(limit));
    const res = await fetch(`${this.baseUrl}/api/sync/pull?${params}`, { headers: { authorization: `Bearer ${this.accessToken}` } });
    if (res.status !== 200) throw new Error(`pull answered ${res.status}: ${await res.text()}`);
    return (await res.json()) as PullResponse;
  }

  /** Follows cursors from `since` until nothing is left; returns the folded state and the last cursor. */
  async pullAll(since?: string, limit?: number, state: FieldState = new Map()): Promise<{ state: FieldState; cursor: string; pages: number }> {
    let cursor = since;
    let pages = 0;
    for (;;) {
      const page = await this.pull(cursor, limit);
      state = mergeChanges(state, page.changes);
      cursor = page.cursor;
      pages++;
      if (!page.hasMore) return { state, cursor, pages };
    }
  }
}

/** A field state as a sorted plain object, for readable equality checks. */
export const asObject = (state: FieldState) => Object.fromEntries([...state.entries()].sort(([a], [b]) => a.localeCompare(b)));
