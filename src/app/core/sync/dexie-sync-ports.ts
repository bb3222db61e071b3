import { HttpClient, HttpErrorResponse, type HttpResponse } from '@angular/common/http';
import type { Table } from 'dexie';
import { firstValueFrom } from 'rxjs';

import { isApiErrorBody } from '@shared/api/api-error';
import { clockOffsetMs, restampClocks, restampFloor } from '@shared/sync/device-clock';
import { MAX_PULL_LIMIT, type ChangeProblem, type FieldChange, type PulledChange, type PullResponse, type PushResponse } from '@shared/api/sync';
import { HlcClock } from '@shared/sync/hlc';
import { applyPulled, emptyRow, type LocalRow } from '@shared/sync/local-row';
import { orSetClocks, renameOrSetClocks, type OrSetState } from '@shared/sync/or-set';
import { COLLECTIONS, fieldSpecOf } from '@shared/sync/schema/collections';
import type { PushOutcome, QueuedChange, SyncPorts } from '@shared/sync/sync-cycle';
import { textFieldMax } from '@shared/text/text-fields';

import { deviceId } from '../device/device-id';
import type { JournalDb } from '../data/journal-db';
import { rememberOverwritten } from './overwritten-edits';

/** Fields per pull page, until the server says many more are to come. */
const SMALL_PAGE = 1000;
/** From this many rows of one collection in a page, stored ones are found from one key listing rather than a read per row. */
const MANY_ROWS = 200;

/** The browser's side of the shared sync cycle: the outbox and rows in Dexie, the server over HTTP. */
export class DexieSyncPorts implements SyncPorts {
  private pageLimit = SMALL_PAGE;
  /**
   * Whether held changes of known collections may be waiting: looked for on the first page only,
   * since applying it releases them all and later pages hold only unknown collections' changes.
   */
  private mayRelease = true;
  /**
   * The offset from the server's time each pulled page's answer gave, saved with the page: a
   * transaction of its own for it waited for the page before and held up the next one.
   */
  private readonly offsets = new WeakMap<PullResponse, number>();

  /**
   * @param known the collections this version of the app knows; changes to others are held on
   * the device and applied after an update that knows them.
   */
  constructor(
    private readonly db: JournalDb,
    private readonly http: HttpClient,
    private readonly known: ReadonlySet<string> = new Set(Object.keys(COLLECTIONS)),
  ) {}

  nextBatch(limit: number): Promise<readonly QueuedChange[]> {
    return this.db.outbox.orderBy('seq').limit(limit).toArray();
  }

  async acknowledge(changes: readonly QueuedChange[]): Promise<void> {
    await this.db.outbox.bulkDelete(changes.map((change) => change.seq!));
  }

  async setAside(refused: readonly { change: QueuedChange; problem: ChangeProblem }[]): Promise<void> {
    const rejectedAt = new Date().toISOString();
    await this.db.transaction('rw', [this.db.outbox, this.db.rejected], async () => {
      await this.db.rejected.bulkPut(
        refused.map(({ change: { seq: _seq, ...change }, problem }) => ({ ...change, code: problem.code, reason: problem.reason, rejectedAt })),
      );
      await this.db.outbox.bulkDelete(refused.map(({ change }) => change.seq!));
    });
  }

  /**
   * Stamps refused changes again from the server-corrected time — and every later change of the
   * outbox with them (written after them, so no less ahead) — in outbox order, after the greatest
   * clock seen from others and every clock the device keeps below the first refused one (see
   * `restampFloor`). The rows' field and set clocks follow, and so does the device clock.
   */
  async restamp(changes: readonly QueuedChange[]): Promise<void> {
    const tables = this.db.tables.filter((table) => this.known.has(table.name)).map((table) => this.db.rows(table.name));
    await this.db.transaction('rw', [this.db.outbox, this.db.meta, ...tables], async () => {
      const offset = await this.offset();
      const from = changes.reduce((min, change) => (change.hlc < min ? change.hlc : min), changes[0]!.hlc);
      const outbox = await this.db.outbox.orderBy('seq').toArray();
      const ordered = outbox.filter((change) => change.hlc >= from);
      const isSet = (change: QueuedChange) => fieldSpecOf(change.collection, change.field)?.kind === 'set';
      const kept: (string | undefined)[] = [(await this.db.meta.get('restamped'))?.value];
      for (const change of outbox) kept.push(change.hlc, ...(isSet(change) ? orSetClocks(change.value as OrSetState) : []));
      // A rare event (a wrong date): reading every row once is the price of never ordering a write before its own past.
      for (const table of tables) {
        await table.each((row) => kept.push(...Object.values(row._hlc), ...Object.values(row._sets ?? {}).flatMap(orSetClocks)));
      }
      const renamed = restampClocks(
        ordered.map((change) => change.hlc),
        deviceId(),
        () => Date.now() + offset,
        restampFloor(from, (await this.db.meta.get('seenClock'))?.value, kept),
      );
      const rename = (hlc: string) => renamed.get(hlc) ?? hlc;
      // A set change carries its clock inside its adds and removes: they move with it, or the server refuses it.
      await this.db.outbox.bulkPut(
        ordered.map((change) => ({
          ...change,
          hlc: rename(change.hlc),
          value: isSet(change) ? renameOrSetClocks(change.value as OrSetState, rename) : change.value,
        })),
      );
      const touched = new Set(ordered.filter((change) => this.known.has(change.collection)).map((change) => `${change.collection}\u0000${change.rowId}`));
      for (const key of touched) {
        const [collection, rowId] = key.split('\u0000') as [string, string];
        const row = await this.db.rows(collection).get(rowId);
        if (!row) continue;
        await this.db.rows(collection).put({
          ...row,
          _hlc: Object.fromEntries(Object.entries(row._hlc).map(([field, hlc]) => [field, rename(hlc)])),
          ...(row._sets ? { _sets: Object.fromEntries(Object.entries(row._sets).map(([field, state]) => [field, renameOrSetClocks(state, rename)])) } : {}),
        });
      }
      const last = [...renamed.values()].at(-1)!;
      await this.db.meta.bulkPut([
        { key: 'clock', value: last },
        { key: 'restamped', value: last },
      ]);
    });
  }

  async push(changes: readonly FieldChange[]): Promise<PushOutcome> {
    const sentAt = Date.now();
    try {
      const res = await firstValueFrom(this.http.post<PushResponse>('/api/sync/push', { deviceId: deviceId(), changes }, { observe: 'response' }));
      await this.learnTime(res, sentAt, res.body?.serverTime);
      if (res.body?.overwritten?.length) await rememberOverwritten(this.db, changes, res.body.overwritten);
      return { kind: 'applied' };
    } catch (error) {
      if (error instanceof HttpErrorResponse) await this.learnTime(error, sentAt);
      if (error instanceof HttpErrorResponse && error.status === 413) return { kind: 'too-large' };
      if (error instanceof HttpErrorResponse && error.status === 400 && isApiErrorBody(error.error) && Array.isArray(error.error.error.details)) {
        return { kind: 'refused', problems: error.error.error.details as ChangeProblem[] };
      }
      throw error;
    }
  }

  async cursor(): Promise<string | undefined> {
    return (await this.db.meta.get('cursor'))?.value;
  }

  async pull(cursor: string | undefined): Promise<PullResponse> {
    const params: Record<string, string> = { limit: String(this.pageLimit) };
    if (cursor) params['since'] = cursor;
    const sentAt = Date.now();
    const res = await firstValueFrom(this.http.get<PullResponse>('/api/sync/pull', { params, observe: 'response' }));
    const offset = offsetFrom(res, sentAt, res.body?.serverTime);
    if (offset !== null && res.body) this.offsets.set(res.body, offset);
    // A long pull (a first sync) goes on in the largest pages: fewer transactions, fewer re-renders.
    if ((res.body?.remaining ?? 0) > SMALL_PAGE) this.pageLimit = MAX_PULL_LIMIT;
    return res.body!;
  }

  /**
   * Merges a page into local rows with the shared rule and saves its cursor in the same
   * transaction, so a crash can only make the next pull repeat work, never skip it. Changes to
   * collections this app does not know are held, with the cursor moving on; held changes whose
   * collection the app now knows (after an update) are applied first.
   */
  async apply(page: PullResponse): Promise<void> {
    const unknown = page.changes.filter((change) => !this.known.has(change.collection));
    const collections = [...new Set(page.changes.map((change) => change.collection))].filter((name) => this.known.has(name));
    const tables = this.db.tables.filter((table) => this.known.has(table.name)).map((table) => table.name);
    // Yjs loads on the first pulled text, before the transaction (which must not await anything else).
    const isText = (change: { collection: string; field: string }) => textFieldMax(change.collection, change.field) !== undefined;
    const heldKnown = () => this.db.held.where('collection').anyOf([...this.known]);
    const releasing = this.mayRelease && (await heldKnown().count()) > 0;
    const texts = page.changes.some(isText) || releasing ? await import('@shared/text/apply-pulled-texts') : null;
    const offset = this.offsets.get(page);
    await this.db.transaction('rw', [...tables.map((name) => this.db.rows(name)), this.db.meta, this.db.held], async () => {
      if (offset !== undefined) await this.db.meta.put({ key: 'clockOffset', value: String(offset) }); // before adoptClocks reads it
      const released = releasing ? await heldKnown().toArray() : [];
      await this.merge(
        [...released.map(({ seq: _seq, ...change }) => change), ...page.changes.filter((change) => this.known.has(change.collection))],
        [...new Set([...collections, ...released.map((change) => change.collection)])],
        texts?.applyPulledTexts ?? null,
      );
      await this.db.held.bulkDelete(released.map((change) => change.seq!));
      await this.db.held.bulkAdd(unknown);
      await this.adoptClocks(page);
      await this.db.meta.bulkPut([
        { key: 'cursor', value: page.cursor },
        { key: 'lastSyncedAt', value: new Date().toISOString() },
      ]);
    });
    this.mayRelease = false;
  }

  /** Mergeable texts merge their Yjs states (when Yjs is loaded); every other field by the shared per-field rule. */
  private async merge(
    changes: readonly PulledChange[],
    collections: readonly string[],
    applyPulledTexts: ((collection: string, row: LocalRow, changes: PulledChange[]) => LocalRow) | null,
  ): Promise<void> {
    const byRow = new Map<string, { collection: string; rowId: string; changes: PulledChange[] }>();
    for (const change of changes) {
      const key = `${change.collection}/${change.rowId}`;
      const entry = byRow.get(key) ?? { collection: change.collection, rowId: change.rowId, changes: [] };
      entry.changes.push(change);
      byRow.set(key, entry);
    }
    for (const collection of collections) {
      const entries = [...byRow.values()].filter((entry) => entry.collection === collection);
      const table = this.db.rows(collection);
      const current = await storedRows(
        table,
        entries.map((entry) => entry.rowId),
      );
      const isText = (change: PulledChange) => applyPulledTexts !== null && textFieldMax(collection, change.field) !== undefined;
      const merged: LocalRow[] = entries.map((entry, n) => {
        const row = applyPulled(
          current[n] ?? emptyRow(entry.rowId),
          entry.changes.filter((change) => !isText(change)),
        );
        return applyPulledTexts ? applyPulledTexts(collection, row, entry.changes.filter(isText)) : row;
      });
      await table.bulkPut(merged.filter((row, n) => row !== current[n]));
    }
  }

  private async offset(): Promise<number> {
    return Number((await this.db.meta.get('clockOffset'))?.value ?? 0) || 0;
  }

  /** Keeps the offset from the server's time: the answer's `serverTime`, else its HTTP Date header. */
  private async learnTime(res: Pick<HttpResponse<unknown>, 'headers'>, sentAt: number, serverTime?: string): Promise<void> {
    const offset = offsetFrom(res, sentAt, serverTime);
    if (offset !== null) await this.db.meta.put({ key: 'clockOffset', value: String(offset) });
  }

  /** HLC receive rule: later local edits order after everything seen from other devices. */
  private async adoptClocks(page: PullResponse): Promise<void> {
    const latest = page.changes.reduce<string | null>((max, change) => (max === null || change.hlc > max ? change.hlc : max), null);
    if (!latest) return;
    const offset = await this.offset();
    const clock = new HlcClock(deviceId(), () => Date.now() + offset, (await this.db.meta.get('clock'))?.value);
    const seen = (await this.db.meta.get('seenClock'))?.value;
    if (!seen || latest > seen) await this.db.meta.put({ key: 'seenClock', value: latest });
    clock.receive(latest, { checkedByServer: true });
    await this.db.meta.put({ key: 'clock', value: clock.current() });
  }
}

/** This device's offset from the server's time: from the answer's `serverTime`, else its HTTP Date header; null without either. */
function offsetFrom(res: Pick<HttpResponse<unknown>, 'headers'>, sentAt: number, serverTime?: string): number | null {
  const server = Date.parse(serverTime ?? res.headers?.get('Date') ?? '');
  return Number.isFinite(server) ? clockOffsetMs(server, sentAt, Date.now()) : null;
}

/**
 * The stored rows for these ids (undefined where there is none), in order. A large page (a first
 * sync's) lists the table's keys once and reads only rows that are there: its rows are mostly
 * new, and a read per row cost as much as writing them.
 */
async function storedRows(table: Table<LocalRow, string>, ids: readonly string[]): Promise<(LocalRow | undefined)[]> {
  if (ids.length < MANY_ROWS) return table.bulkGet([...ids]);
  const keys = new Set(await table.toCollection().primaryKeys());
  const found = await table.bulkGet(ids.filter((id) => keys.has(id)));
  const byId = new Map(found.map((row) => [row!.id, row]));
  return ids.map((id) => byId.get(id));
}
