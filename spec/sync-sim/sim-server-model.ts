import { MAX_PUSH_CHANGES, type FieldChange, type PulledChange } from '../../shared/sync/field-change';
import { wins } from '../../shared/sync/merge';
import { fieldKey, mergeChanges, type FieldState } from '../../shared/sync/merge-changes';
import { collectionSpec } from '../../shared/sync/schema/collections';
import { validateChange } from '../../shared/sync/validate-change';
import type { SimRequest, SimResponse, SimServer } from './sim-wire';

/**
 * The sync server in memory, for one reader: what `sync.routes.ts` + `SyncStore` do, step for
 * step, with the shared code they use (validateChange, wins, mergeChanges) and none of the I/O.
 * Push: refuse the whole batch if any change is invalid; reduce the batch to one winner per
 * field; a field wins over the stored one by a greater clock; every row that won something gets
 * the next sequence. Pull: whole rows after the cursor in sequence order, at least one row per
 * page, no more fields than `limit` otherwise. The fault-schedule spec replays schedules against
 * the real server and checks that both answer alike.
 */
export class ServerModel implements SimServer {
  private state: FieldState = new Map();
  /** Per row (`collection/rowId`), the sequence of its last winning write. */
  private readonly rowSeq = new Map<string, number>();
  private seq = 0;

  async handle(request: SimRequest, nowMs: number): Promise<SimResponse> {
    return request.kind === 'push' ? this.push(request.body.changes, nowMs) : this.pull(request.since, request.limit);
  }

  /** Every field's winning value, as a fresh full pull would fold it. */
  fieldState(): FieldState {
    return this.state;
  }

  private push(changes: readonly unknown[], nowMs: number): SimResponse {
    if (changes.length > MAX_PUSH_CHANGES) return error(413, 'too_large');
    const problems = changes.map((change, index) => validateChange(change, index, nowMs)).filter((p) => p !== null);
    if (problems.length > 0) {
      const onlyClock = problems.every((p) => p.code === 'clock_ahead');
      return error(400, onlyClock ? 'clock_ahead' : 'invalid_changes', problems);
    }
    // As SyncStore: one winner per field of the batch; rows by collection, in first-seen order.
    const batchWinners = new Map<string, FieldChange>();
    for (const change of changes as FieldChange[]) {
      const key = fieldKey(change);
      if (wins(change.hlc, batchWinners.get(key)?.hlc)) batchWinners.set(key, change);
    }
    const winners = [...batchWinners.values()].filter((change) => wins(change.hlc, this.state.get(fieldKey(change))?.hlc));
    this.state = mergeChanges(this.state, winners);
    const rowsInOrder = new Map<string, string[]>();
    for (const change of changes as FieldChange[]) {
      const rows = rowsInOrder.get(change.collection) ?? [];
      rowsInOrder.set(change.collection, rows);
      if (!rows.includes(change.rowId)) rows.push(change.rowId);
    }
    const wonRows = new Set(winners.map((change) => `${change.collection}/${change.rowId}`));
    for (const [collection, rows] of rowsInOrder) {
      for (const rowId of rows) {
        const seq = ++this.seq; // nextval for every input row, kept only where something won
        if (wonRows.has(`${collection}/${rowId}`)) this.rowSeq.set(`${collection}/${rowId}`, seq);
      }
    }
    return { status: 200, body: { applied: winners.length, duplicates: changes.length - winners.length, serverTime: new Date(nowMs).toISOString() } };
  }

  private pull(since: string | undefined, limit: number): SimResponse {
    const sinceSeq = since === undefined ? 0 : Number(/^m(\d+)$/.exec(since)?.[1] ?? NaN);
    if (!Number.isInteger(sinceSeq) || limit < 1) return error(400, 'invalid_input');
    const rows = [...this.rowSeq.entries()].filter(([, seq]) => seq > sinceSeq).sort(([, a], [, b]) => a - b);
    const changes: PulledChange[] = [];
    let lastSeq = sinceSeq;
    let taken = 0;
    for (const [row, seq] of rows) {
      const pieces = this.rowFields(row);
      if (taken > 0 && changes.length + pieces.length > limit) break;
      changes.push(...pieces);
      lastSeq = seq;
      taken++;
    }
    return { status: 200, body: { changes, cursor: `m${lastSeq}`, hasMore: taken < rows.length, serverTime: new Date().toISOString() } };
  }

  private rowFields(row: string): PulledChange[] {
    const [collection, rowId] = row.split('/') as [string, string];
    return Object.keys(collectionSpec(collection)!.fields).flatMap((field) => {
      const stamped = this.state.get(`${row}/${field}`);
      return stamped ? [{ collection, rowId, field, value: stamped.value, hlc: stamped.hlc }] : [];
    });
  }
}

function error(status: number, code: string, details?: unknown): SimResponse {
  return { status, body: { error: { code, message: code, ...(details ? { details } : {}) } } };
}
