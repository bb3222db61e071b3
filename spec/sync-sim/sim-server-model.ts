import { isDeepStrictEqual } from 'node:util';

import { MAX_PUSH_CHANGES, type FieldChange, type PulledChange } from '../../shared/api/sync';
import { wins } from '../../shared/sync/merge';
import { fieldKey, type FieldState } from '../../shared/sync/merge-changes';
import { setDeltaOf } from '../../shared/sync/merge-set';
import { joinOrSet, orSetElements, type OrSetState } from '../../shared/sync/or-set';
import { collectionSpec, fieldSpecOf } from '../../shared/sync/schema/collections';
import { validateChange } from '../../shared/sync/validate-change';
import type { SimRequest, SimResponse, SimServer } from './sim-wire';

/**
 * The sync server in memory, for one reader: what `sync.routes.ts` + `SyncStore` do, step for
 * step, with the shared code they use (validateChange, wins, mergeChanges) and none of the I/O.
 * Push: refuse the whole batch if any change is invalid (`clock_ahead` when only clocks are);
 * reduce the batch to one piece per row (one winner per last-writer-wins field, the joined
 * deltas of each set field); a field wins over the stored one by a greater clock, a set field
 * when its joined state grows (`merge-sql.ts`); every row that won something gets the next
 * sequence. Every answer carries `serverTime` (and `dateMs`, the HTTP Date header). Pull: whole rows after the cursor in sequence order, at least one row per
 * page, no more fields than `limit` otherwise. The fault-schedule spec replays schedules against
 * the real server and checks that both answer alike.
 */
export class ServerModel implements SimServer {
  private state: FieldState = new Map();
  /** Per row (`collection/rowId`), the sequence of its last winning write. */
  private readonly rowSeq = new Map<string, number>();
  private seq = 0;

  async handle(request: SimRequest, nowMs: number): Promise<SimResponse> {
    return request.kind === 'push' ? this.push(request.body.changes, nowMs) : this.pull(request.since, request.limit, nowMs);
  }

  /** Every field's winning value, as a fresh full pull would fold it. */
  fieldState(): FieldState {
    return this.state;
  }

  private push(changes: readonly unknown[], nowMs: number): SimResponse {
    if (changes.length > MAX_PUSH_CHANGES) return error(413, 'too_large', nowMs);
    const problems = changes.map((change, index) => validateChange(change, index, nowMs)).filter((p) => p !== null);
    if (problems.length > 0) {
      const onlyClock = problems.every((p) => p.code === 'clock_ahead');
      return error(400, onlyClock ? 'clock_ahead' : 'invalid_changes', nowMs, problems);
    }
    // As SyncStore's reduceBatch: per row, one winner per plain field, the joined deltas per set field; rows by collection, in first-seen order.
    const rows = new Map<string, { lww: Map<string, FieldChange>; sets: Map<string, { delta: OrSetState; hlc: string }> }>();
    for (const change of changes as FieldChange[]) {
      const row = `${change.collection}/${change.rowId}`;
      const pieces = rows.get(row) ?? { lww: new Map(), sets: new Map() };
      rows.set(row, pieces);
      if (fieldSpecOf(change.collection, change.field)?.kind === 'set') {
        const piece = pieces.sets.get(change.field);
        const before = joinOrSet(this.state.get(fieldKey(change))?.state, piece?.delta);
        const delta = joinOrSet(piece?.delta, setDeltaOf(before, change));
        pieces.sets.set(change.field, { delta, hlc: piece && piece.hlc > change.hlc ? piece.hlc : change.hlc });
      } else if (wins(change.hlc, pieces.lww.get(change.field)?.hlc, change.value, pieces.lww.get(change.field)?.value)) {
        pieces.lww.set(change.field, change);
      }
    }
    let applied = 0;
    const next = new Map(this.state);
    const wonRows = new Set<string>();
    for (const [row, { lww, sets }] of rows) {
      const isNew = !this.rowSeq.has(row);
      const beats = (field: string, hlc: string) => isNew || wins(hlc, this.state.get(`${row}/${field}`)?.hlc);
      const grown = [...sets].filter(([field, { delta }]) => isNew || this.joinSet(this.state.get(`${row}/${field}`)?.state, delta) !== 'same');
      const lwwWon = [...lww.values()].filter((change) =>
        wins(change.hlc, this.state.get(fieldKey(change))?.hlc, change.value, this.state.get(fieldKey(change))?.value),
      );
      applied +=
        lwwWon.length +
        grown.reduce((n, [field]) => n + (changes as FieldChange[]).filter((c) => `${c.collection}/${c.rowId}` === row && c.field === field).length, 0);
      if (!isNew && lwwWon.length === 0 && grown.length === 0) continue; // the row is not written at all
      wonRows.add(row);
      for (const change of lwwWon) next.set(fieldKey(change), { value: change.value, hlc: change.hlc });
      for (const [field, { delta, hlc }] of sets) {
        const stored = this.state.get(`${row}/${field}`);
        const joined = this.joinSet(stored?.state, delta);
        const state = joined !== 'same' ? joined : (stored?.state ?? {});
        // The set column and state follow the join; the field's clock moves only to a greater one (as SQL's `newer`).
        next.set(`${row}/${field}`, { value: orSetElements(state), hlc: beats(field, hlc) || !stored ? hlc : stored.hlc, state });
      }
    }
    this.state = next;
    for (const row of rows.keys()) {
      const seq = ++this.seq; // nextval for every input row, kept only where something won
      if (wonRows.has(row)) this.rowSeq.set(row, seq);
    }
    return { status: 200, dateMs: nowMs, body: { applied, duplicates: changes.length - applied, serverTime: new Date(nowMs).toISOString() } };
  }

  /** The stored state joined with a batch's delta, or `'same'` when nothing grows: SQL's `lamplight_orset_join` and `grows`. */
  protected joinSet(stored: OrSetState | undefined, delta: OrSetState): OrSetState | 'same' {
    const joined = joinOrSet(stored ?? {}, delta);
    return isDeepStrictEqual(joined, stored ?? {}) ? 'same' : joined;
  }

  private pull(since: string | undefined, limit: number, nowMs: number): SimResponse {
    const sinceSeq = since === undefined ? 0 : Number(/^m(\d+)$/.exec(since)?.[1] ?? NaN);
    if (!Number.isInteger(sinceSeq) || limit < 1) return error(400, 'invalid_input', nowMs);
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
    return { status: 200, dateMs: nowMs, body: { changes, cursor: `m${lastSeq}`, hasMore: taken < rows.length, serverTime: new Date(nowMs).toISOString() } };
  }

  private rowFields(row: string): PulledChange[] {
    const [collection, rowId] = row.split('/') as [string, string];
    return Object.keys(collectionSpec(collection)!.fields).flatMap((field) => {
      const stamped = this.state.get(`${row}/${field}`);
      if (!stamped) return [];
      return stamped.state
        ? [{ collection, rowId, field, value: stamped.value, hlc: stamped.hlc, state: stamped.state }]
        : [{ collection, rowId, field, value: stamped.value, hlc: stamped.hlc }];
    });
  }
}

function error(status: number, code: string, nowMs: number, details?: unknown): SimResponse {
  return { status, dateMs: nowMs, body: { error: { code, message: code, ...(details ? { details } : {}) } } };
}
