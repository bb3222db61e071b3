import type { DataSource } from 'typeorm';

import { MAX_PULL_BYTES, type FieldChange, type PulledChange } from '../../../shared/api/sync';
import { wins } from '../../../shared/sync/merge';
import { setDeltaOf } from '../../../shared/sync/merge-set';
import { joinOrSet, type OrSetState } from '../../../shared/sync/or-set';
import { columnName, type FieldSpec } from '../../../shared/sync/schema/field';
import { COLLECTIONS, collectionSpec, fieldSpecOf } from '../../../shared/sync/schema/collections';
import { changedTablesSql, mergeSql, pullPageSql, remainingSql } from './merge-sql';
import { notifyPushedSql } from './sync-notifications';
import { queryableOf, TextStore } from './text-store';
import { TEXT_FIELDS, textFieldMax } from '../../../shared/text/text-fields';

const SPECS = Object.values(COLLECTIONS);
/** Per collection: its columns by field. */
const COLUMNS = new Map(SPECS.map((spec) => [spec.name, new Map(Object.keys(spec.fields).map((field) => [field, columnName(field)]))]));
/**
 * Merge statements by collection and the fields a batch touches, each prepared once per
 * connection. Devices send a handful of field sets (a title edit, a status change, a new book),
 * so few are made; past the cap, statements still run, unprepared and uncached.
 */
const MERGES = new Map<string, { name?: string; text: string }>();
const MAX_PREPARED_MERGES = 200;

function mergeStatement(collection: string, fields: readonly string[]): { name?: string; text: string } {
  const key = `${collection}:${fields.join(',')}`;
  let statement = MERGES.get(key);
  if (!statement) {
    const text = mergeSql(collectionSpec(collection)!, fields);
    statement = MERGES.size < MAX_PREPARED_MERGES ? { name: `lamplight_merge_${MERGES.size}`, text } : { text };
    if (statement.name) MERGES.set(key, statement);
  }
  return statement;
}
/** Pull statements, prepared once per connection where the pool allows (see `namedStatements`). */
const PULL_PAGE_SQL = SPECS.map((spec, n) => ({ name: `lamplight_pull_${n}`, text: pullPageSql(spec) }));
const CHANGED_TABLES_SQL = { name: 'lamplight_changed_tables', text: changedTablesSql(SPECS) };
const REMAINING_SQL = remainingSql(SPECS);
const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/;
/** A pull's first guess at fields per row, to size each table's page from the field limit. */
const ASSUMED_FIELDS_PER_ROW = 4;
/** Fewer rows than this a table is never asked for (a round trip costs more than a few rows). */
const MIN_ROWS_PER_TABLE = 16;
/** Positions whose remaining count an instance remembers (a few per first sync under way). */
const MAX_REMEMBERED_POSITIONS = 1000;

/**
 * A row as a pull reads it, as an array in `pullPageSql`'s column order (id, seq, clocks, sets,
 * then the fields in the schema's order): forty-odd named properties a row cost more to make.
 */
type PulledRow = unknown[];

/** The part of a node-postgres client the hot path uses. */
interface PgClient {
  query(config: { name?: string; text: string; values?: unknown[]; rowMode?: 'array' } | string, values?: unknown[]): Promise<{ rows: Record<string, unknown>[] }>;
}

/**
 * One row's pieces from a batch: the winning value (by column) and clock of each field it
 * touches, and for set fields the joined delta.
 */
interface RowPieces {
  id: string;
  clocks: Record<string, string>;
  sets: Record<string, OrSetState>;
  [column: string]: unknown;
}

/** What a push did with each change (see {@link classify}). */
export interface PushResult {
  readonly applied: number;
  readonly duplicates: number;
  readonly superseded: number;
  /** The superseded changes, with the clock that beat each. */
  readonly overwritten: { readonly id: string; readonly by: string }[];
}

export interface PulledPage {
  readonly changes: PulledChange[];
  /** The sequence to continue after. */
  readonly lastSeq: number;
  readonly hasMore: boolean;
  /** `changes` as JSON text in UTF-8, exactly as measured against the byte budget (the route sends it as is). */
  readonly changesBytes: Buffer;
  /** Rows still to pull after this page (only while there are more pages). */
  readonly remaining?: number;
}

/** The server's side of sync: merging pushed changes and reading them back, per user. */
export class SyncStore {
  /** Rows remaining after a position a pull just answered, by `user/seq` (see {@link remaining}). */
  private readonly remainingAfter = new Map<string, number>();

  /**
   * `namedStatements: false` sends merge statements unnamed (a parse on every push), for a
   * transaction-mode pooler such as PgBouncer, where the next transaction may run on a server
   * connection that never saw the prepared statement.
   */
  constructor(
    private readonly dataSource: DataSource,
    private readonly options: { readonly namedStatements?: boolean } = {},
  ) {}

  /**
   * Applies a validated batch in one transaction and answers how many changes took effect.
   * Each user's writes are serialised by a transaction-level advisory lock, so sequence numbers
   * commit in the order they were taken and a pull cursor can never step over a change that
   * commits later.
   *
   * A change is applied at most once without keeping its id: clocks are unique per write, so a
   * change sent again finds its own clock (or a later one) already stored and changes nothing.
   * Such changes are counted as `duplicates`, like any change that arrived after a newer value.
   */
  async push(userId: string, changes: readonly FieldChange[]): Promise<PushResult> {
    // Mergeable texts merge per character in text-store.ts, after the per-field merge; `index` is the change's place in the batch.
    const texts = [...changes.entries()]
      .filter(([, change]) => textFieldMax(change.collection, change.field) !== undefined)
      .map(([index, change]) => ({ index, change }));
    const fieldChanges = texts.length === 0 ? changes : changes.filter((change) => textFieldMax(change.collection, change.field) === undefined);
    return this.inUserTransaction(userId, async (client) => {
      const byCollection = reduceBatch(fieldChanges, await storedSetStates(client, userId, fieldChanges));
      const before = new Map<string, { c: Record<string, string>; g: (string | null)[] }>();
      for (const [collection, rows] of byCollection) {
        const touched = new Set<string>();
        for (const row of rows.values()) for (const field of Object.keys(row.clocks)) touched.add(field);
        // In the schema's order, so the same fields always make the same statement.
        const fields = Object.keys(collectionSpec(collection)!.fields).filter((field) => touched.has(field));
        const statement = mergeStatement(collection, fields);
        const text = this.options.namedStatements === false ? { text: statement.text } : statement;
        const result = await client.query({ ...text, values: [userId, JSON.stringify([...rows.values()])] });
        const stored = (result.rows[0]?.['before'] ?? {}) as Record<string, { c: Record<string, string>; g: (string | null)[] }>;
        for (const [rowId, entry] of Object.entries(stored)) before.set(`${collection}/${rowId}`, entry);
      }
      const outcome = classify(fieldChanges, byCollection, before);
      const textsWon = texts.length > 0 ? await TextStore.merge(client, userId, texts) : 0;
      const result = { ...outcome, applied: outcome.applied + textsWon, duplicates: outcome.duplicates + texts.length - textsWon };
      // Live updates: the poke goes with COMMIT (one round trip) and is delivered on commit only.
      return { result, beforeCommit: result.applied > 0 ? notifyPushedSql(userId) : '' };
    });
  }

  /**
   * Runs `work` in a transaction that first takes the user's advisory lock. This is the hot path
   * of sync, so it talks to the node-postgres client directly: BEGIN and the lock go in one
   * round trip, and the merge statements are prepared once per connection.
   */
  private async inUserTransaction<T>(userId: string, work: (client: PgClient) => Promise<{ result: T; beforeCommit: string }>): Promise<T> {
    // Inlined into SQL text, so it must be exactly a UUID (it comes from our own verified token).
    if (!UUID.test(userId)) throw new Error('user id must be a lower-case UUID');
    const runner = this.dataSource.createQueryRunner();
    await runner.connect();
    const client = (runner as unknown as { databaseConnection: PgClient }).databaseConnection;
    try {
      await client.query(`BEGIN; SELECT pg_advisory_xact_lock(hashtextextended('${userId}', 0))`);
      const { result, beforeCommit } = await work(client);
      await client.query(`${beforeCommit}COMMIT`);
      return result;
    } catch (error) {
      await client.query('ROLLBACK').catch(() => undefined);
      throw error;
    } finally {
      await runner.release();
    }
  }

  /**
   * Every field of every row changed after `sinceSeq`, with its current winning value, in
   * sequence order. Whole rows, not just the fields that changed: a row's older fields may not
   * have reached this cursor's holder yet (the row can move past a page boundary while they
   * page), and sending current values again is harmless to an idempotent merge. Pages end on
   * whole rows, hold at most `limit` fields and about `maxBytes` of JSON; the first row always
   * fits, so paging always moves on.
   */
  async pull(userId: string, sinceSeq: number, limit: number, maxBytes = MAX_PULL_BYTES): Promise<PulledPage> {
    // One cheap probe says which tables have anything new, and up to where; most pulls (devices up to date) end here.
    const [probe] = await this.read<{ latest: (string | null)[] }>(CHANGED_TABLES_SQL, [userId, sinceSeq]);
    const latest = probe?.latest ?? [];
    let tables = latest.flatMap((seq, c) => (seq === null ? [] : [c]));
    if (tables.length === 0) return { changes: [], changesBytes: Buffer.from('[]'), lastSeq: sinceSeq, hasMore: false };
    // Every row up to here has committed (see changedTablesSql): reading no further, the tables' reads agree.
    const upTo = Math.max(...tables.map((c) => Number(latest[c])));
    const changes: PulledChange[] = [];
    // Each round's rows as one JSON array, measured once and sent as they are (no second serialisation).
    const parts: Buffer[] = [];
    let lastSeq = sinceSeq;
    let taken = 0;
    let bytes = 0;
    let hasMore = false;
    let fieldsPerRow = ASSUMED_FIELDS_PER_ROW;
    while (tables.length > 0) {
      // Each table pages its own (user_id, seq) index, sized from the fields still to fill; one row
      // more than asked says that the table goes on, and bounds what can be taken from the others.
      const rowLimit = Math.max(MIN_ROWS_PER_TABLE, Math.ceil((limit - changes.length) / fieldsPerRow / tables.length));
      const pages: PulledRow[][] = [];
      for (const c of tables) pages.push(await this.read<PulledRow>(PULL_PAGE_SQL[c]!, [userId, lastSeq, rowLimit + 1, upTo], 'array'));
      let bound = Infinity;
      const rows: { c: number; seq: number; row: PulledRow }[] = [];
      for (const [n, page] of pages.entries()) {
        if (page.length > rowLimit) bound = Math.min(bound, Number(page[rowLimit - 1]![1]));
        for (const row of page) rows.push({ c: tables[n]!, seq: Number(row[1]), row });
      }
      if (pages.length > 1) rows.sort((a, b) => a.seq - b.seq);
      // The rows that can be taken (in order, up to the bound) and may fit the fields still free.
      const candidates: PulledChange[][] = [];
      let fields = changes.length;
      for (const { c, seq, row } of rows) {
        if (seq > bound || (candidates.length > 0 && fields >= limit)) break;
        candidates.push(rowFields(SPECS[c]!.name, row));
        fields += candidates.at(-1)!.length;
      }
      // Texts' Yjs states count towards the page's bytes too, so they are read before the page is cut.
      const withStates = candidates.some((row) => hasTextFields(row))
        ? await TextStore.withStates(queryableOf(this.dataSource), userId, candidates.flat())
        : candidates.flat();
      const [fieldsLeft, bytesLeft, first] = [limit - changes.length, maxBytes - bytes, taken === 0] as const;
      const took = takeWhole(candidates, withStates, fieldsLeft, bytesLeft, first) ?? takeRowByRow(candidates, withStates, fieldsLeft, bytesLeft, first);
      for (let n = 0; n < took.fields; n++) changes.push(withStates[n]!);
      if (took.fields > 0) parts.push(took.json);
      bytes += took.json.length;
      taken += took.rows;
      if (took.rows > 0) lastSeq = rows[took.rows - 1]!.seq;
      const full = took.rows < candidates.length;
      // A row read but not taken is still to come; none means every table ran out.
      hasMore = rows.some(({ seq }) => seq > lastSeq);
      if (!hasMore || full || changes.length >= limit || bytes >= maxBytes) break;
      tables = [...new Set(rows.filter(({ seq }) => seq > lastSeq).map(({ c }) => c))];
      fieldsPerRow = Math.max(1, changes.length / taken);
    }
    // Most pages are one round: its bytes are the answer's as they are, without a copy.
    const changesBytes = parts.length === 1 ? parts[0]! : joinJsonArrays(parts);
    if (!hasMore) return { changes, changesBytes, lastSeq, hasMore };
    return { changes, changesBytes, lastSeq, hasMore, remaining: await this.remaining(userId, sinceSeq, lastSeq, taken) };
  }

  /**
   * Rows still to pull after `lastSeq`. Counted once per first sync: the next page's count is
   * this one less the rows it took (remembered by position, per instance), so a long pull does not
   * count the rest of the account on every page (which made it quadratic). Rows written meanwhile
   * make it an estimate, which is all the progress bar needs; it is counted again when it runs out.
   */
  private async remaining(userId: string, sinceSeq: number, lastSeq: number, taken: number): Promise<number> {
    const known = this.remainingAfter.get(`${userId}/${sinceSeq}`);
    this.remainingAfter.delete(`${userId}/${sinceSeq}`);
    let remaining = known === undefined ? 0 : known - taken;
    if (remaining <= 0) [{ remaining }] = (await this.dataSource.query(REMAINING_SQL, [userId, lastSeq])) as [{ remaining: number }];
    if (this.remainingAfter.size >= MAX_REMEMBERED_POSITIONS) this.remainingAfter.delete(this.remainingAfter.keys().next().value!);
    this.remainingAfter.set(`${userId}/${lastSeq}`, remaining);
    return remaining;
  }

  /**
   * A read outside a transaction, straight on the pool: prepared under its name once per
   * connection (planning the pull costs more than running it), unnamed behind a transaction pooler.
   */
  private async read<Row>(statement: { name: string; text: string }, values: unknown[], rowMode?: 'array'): Promise<Row[]> {
    const pool = (this.dataSource.driver as unknown as { master: PgClient }).master;
    const config = { ...(this.options.namedStatements === false ? { text: statement.text } : statement), values, ...(rowMode ? { rowMode } : {}) };
    return (await pool.query(config)).rows as Row[];
  }
}

/**
 * Reduces a batch to one piece per row: one statement may not touch a row twice. A
 * last-writer-wins field keeps its winner; a set field joins its deltas, and an older app's whole
 * list becomes a delta against the stored state (and what the batch did before it).
 */
function reduceBatch(changes: readonly FieldChange[], stored: ReadonlyMap<string, OrSetState>): Map<string, Map<string, RowPieces>> {
  const byCollection = new Map<string, Map<string, RowPieces>>();
  for (const change of changes) {
    const rows = byCollection.get(change.collection) ?? new Map<string, RowPieces>();
    byCollection.set(change.collection, rows);
    const row = rows.get(change.rowId) ?? { id: change.rowId, clocks: {}, sets: {} };
    rows.set(change.rowId, row);
    if (fieldSpecOf(change.collection, change.field)?.kind === 'set') {
      const before = joinOrSet(stored.get(storedKey(change.collection, change.rowId, change.field)), row.sets[change.field]);
      row.sets[change.field] = joinOrSet(row.sets[change.field], setDeltaOf(before, change));
      if (wins(change.hlc, row.clocks[change.field])) row.clocks[change.field] = change.hlc;
    } else if (wins(change.hlc, row.clocks[change.field], change.value, row[COLUMNS.get(change.collection)!.get(change.field)!])) {
      row[COLUMNS.get(change.collection)!.get(change.field)!] = change.value;
      row.clocks[change.field] = change.hlc;
    }
  }
  return byCollection;
}

/**
 * Sorts a pushed batch: a change is a duplicate when the server already had its clock (a re-send,
 * or a set change that added nothing new), superseded when a greater clock — stored, or later in
 * the same batch — won its field, and applied otherwise.
 */
function classify(
  changes: readonly FieldChange[],
  byCollection: ReadonlyMap<string, ReadonlyMap<string, RowPieces>>,
  before: ReadonlyMap<string, { c: Record<string, string>; g: (string | null)[] }>,
): PushResult {
  let applied = 0;
  let duplicates = 0;
  const overwritten: { id: string; by: string }[] = [];
  for (const change of changes) {
    const stored = before.get(`${change.collection}/${change.rowId}`);
    const storedClock = stored?.c[change.field];
    if (fieldSpecOf(change.collection, change.field)?.kind === 'set') {
      if (!stored || stored.g.includes(change.field)) applied++;
      else duplicates++;
      continue;
    }
    const batchClock = byCollection.get(change.collection)!.get(change.rowId)!.clocks[change.field]!;
    const winner = storedClock !== undefined && storedClock > batchClock ? storedClock : batchClock;
    if (change.hlc < winner) overwritten.push({ id: change.id, by: winner });
    else if (change.hlc === storedClock) duplicates++;
    else applied++;
  }
  return { applied, duplicates, superseded: overwritten.length, overwritten };
}

const storedKey = (collection: string, rowId: string, field: string) => `${collection}/${rowId}/${field}`;

/** The stored states of set fields that a batch writes whole lists to (older apps), read under the user's lock. */
async function storedSetStates(client: PgClient, userId: string, changes: readonly FieldChange[]): Promise<Map<string, OrSetState>> {
  const rowsByCollection = new Map<string, Set<string>>();
  for (const change of changes) {
    if (!Array.isArray(change.value) || fieldSpecOf(change.collection, change.field)?.kind !== 'set') continue;
    rowsByCollection.set(change.collection, (rowsByCollection.get(change.collection) ?? new Set()).add(change.rowId));
  }
  const states = new Map<string, OrSetState>();
  for (const [collection, rowIds] of rowsByCollection) {
    const { rows } = await client.query({
      text: `SELECT id, sets FROM ${collectionSpec(collection)!.table} WHERE user_id = $1 AND id = ANY($2::uuid[])`,
      values: [userId, [...rowIds]],
    });
    for (const row of rows) {
      for (const [field, state] of Object.entries(row['sets'] as Record<string, OrSetState>)) states.set(storedKey(collection, row['id'] as string, field), state);
    }
  }
  return states;
}

/** Per collection: each field's name, place in a pulled row (after id, seq, clocks and sets) and whether it is a set, made once, not per row. */
const PULLED_FIELDS = new Map(
  SPECS.map((spec) => [
    spec.name,
    Object.entries(spec.fields as Record<string, FieldSpec>).map(([field, fieldSpec], n) => ({ field, index: 4 + n, set: fieldSpec.kind === 'set' })),
  ]),
);
/** Collections with a mergeable text field, whose pulled fields carry the text's state from `text_states`. */
const WITH_TEXTS = new Set(TEXT_FIELDS.map((entry) => entry.collection.name));
const hasTextFields = (row: readonly PulledChange[]) => row.length > 0 && WITH_TEXTS.has(row[0]!.collection);

/** The rows a page takes of what a round read: how many, their fields and their JSON text (an array) in UTF-8. */
interface Taken {
  readonly rows: number;
  readonly fields: number;
  readonly json: Buffer;
}

/** Several JSON arrays' bytes as one array (a page of several rounds). */
function joinJsonArrays(arrays: readonly Buffer[]): Buffer {
  const inner = arrays.flatMap((array, n) => [Buffer.from(n === 0 ? '' : ','), array.subarray(1, -1)]);
  return Buffer.concat([Buffer.from('['), ...inner, Buffer.from(']')]);
}

/**
 * The rows that fit the fields left, as one JSON text made by one `JSON.stringify` (a page's
 * thousands of small texts, one per row, cost several times as much to make and join), when it
 * fits the bytes left too; `undefined` when it does not, so the rows are measured one by one.
 * The text is encoded once, straight from what `JSON.stringify` built in pieces: counting its
 * bytes first (`Buffer.byteLength`) makes V8 copy it into one piece, which cost more than encoding.
 */
function takeWhole(rows: readonly PulledChange[][], pieces: readonly PulledChange[], fieldsLeft: number, bytesLeft: number, first: boolean): Taken | undefined {
  let count = 0;
  let fields = 0;
  while (count < rows.length && (fields + rows[count]!.length <= fieldsLeft || (first && count === 0))) fields += rows[count++]!.length;
  const json = Buffer.from(JSON.stringify(count === rows.length ? pieces : pieces.slice(0, fields)));
  return json.length <= bytesLeft || (first && count === 1) ? { rows: count, fields, json } : undefined;
}

/** The rows that fit, measured one by one (a page near its byte budget); the first row always fits, so paging moves on. */
function takeRowByRow(rows: readonly PulledChange[][], pieces: readonly PulledChange[], fieldsLeft: number, bytesLeft: number, first: boolean): Taken {
  const parts: string[] = [];
  let count = 0;
  let offset = 0;
  let bytes = 0;
  for (const row of rows) {
    const json = JSON.stringify(pieces.slice(offset, offset + row.length));
    const size = Buffer.byteLength(json);
    if ((!first || count > 0) && (offset + row.length > fieldsLeft || bytes + size > bytesLeft)) break;
    if (row.length > 0) parts.push(json.slice(1, -1));
    count++;
    offset += row.length;
    bytes += size;
  }
  return { rows: count, fields: offset, json: Buffer.from(`[${parts.join(',')}]`) };
}

function rowFields(collection: string, row: PulledRow): PulledChange[] {
  const [id, , clocks, sets] = row as [string, string, Record<string, string>, Record<string, OrSetState> | null];
  const changes: PulledChange[] = [];
  for (const { field, index, set } of PULLED_FIELDS.get(collection)!) {
    const hlc = clocks[field];
    if (hlc === undefined) continue;
    const value = row[index] ?? null;
    changes.push(set ? { collection, rowId: id, field, value, hlc, state: sets?.[field] ?? {} } : { collection, rowId: id, field, value, hlc });
  }
  return changes;
}
