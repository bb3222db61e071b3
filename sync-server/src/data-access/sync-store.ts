import type { DataSource } from 'typeorm';

import type { FieldChange, PulledChange } from '../../../shared/sync/field-change';
import { wins } from '../../../shared/sync/merge';
import { columnName } from '../../../shared/sync/schema/field';
import { COLLECTIONS, collectionSpec } from '../../../shared/sync/schema/collections';
import { mergeSql, pullSql } from './merge-sql';
import { queryableOf, TextStore } from './text-store';
import { textFieldMax } from '../../../shared/text/text-fields';

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
const PULL_SQL = pullSql(SPECS);
const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/;

/** The part of a node-postgres client the hot path uses. */
interface PgClient {
  query(config: { name?: string; text: string; values?: unknown[] } | string, values?: unknown[]): Promise<{ rows: Record<string, unknown>[] }>;
}

/** One row's pieces from a batch: the winning value (by column) and clock of each field it touches. */
interface RowPieces {
  id: string;
  clocks: Record<string, string>;
  [column: string]: unknown;
}

export interface PulledPage {
  readonly changes: PulledChange[];
  /** The sequence to continue after. */
  readonly lastSeq: number;
  readonly hasMore: boolean;
}

/** The server's side of sync: merging pushed changes and reading them back, per user. */
export class SyncStore {
  constructor(private readonly dataSource: DataSource) {}

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
  async push(userId: string, changes: readonly FieldChange[]): Promise<{ applied: number; duplicates: number }> {
    const byCollection = new Map<string, Map<string, RowPieces>>();
    // Mergeable texts merge per character in text-store.ts, after the per-field merge.
    const texts: { index: number; change: FieldChange }[] = [];
    for (const [index, change] of changes.entries()) {
      if (textFieldMax(change.collection, change.field) !== undefined) {
        texts.push({ index, change });
        continue;
      }
      const rows = byCollection.get(change.collection) ?? new Map<string, RowPieces>();
      byCollection.set(change.collection, rows);
      const row = rows.get(change.rowId) ?? { id: change.rowId, clocks: {} };
      rows.set(change.rowId, row);
      // One statement may not touch a row twice: reduce the batch to one winner per field first.
      if (wins(change.hlc, row.clocks[change.field])) {
        row[COLUMNS.get(change.collection)!.get(change.field)!] = change.value;
        row.clocks[change.field] = change.hlc;
      }
    }
    const applied = await this.inUserTransaction(userId, async (client) => {
      let won = 0;
      for (const [collection, rows] of byCollection) {
        const touched = new Set<string>();
        for (const row of rows.values()) for (const field of Object.keys(row.clocks)) touched.add(field);
        // In the schema's order, so the same fields always make the same statement.
        const fields = Object.keys(collectionSpec(collection)!.fields).filter((field) => touched.has(field));
        const statement = mergeStatement(collection, fields);
        const result = await client.query({ ...statement, values: [userId, JSON.stringify([...rows.values()])] });
        won += Number(result.rows[0]?.['won'] ?? 0);
      }
      if (texts.length > 0) won += await TextStore.merge(client, userId, texts);
      return won;
    });
    return { applied, duplicates: changes.length - applied };
  }

  /**
   * Runs `work` in a transaction that first takes the user's advisory lock. This is the hot path
   * of sync, so it talks to the node-postgres client directly: BEGIN and the lock go in one
   * round trip, and the merge statements are prepared once per connection.
   */
  private async inUserTransaction<T>(userId: string, work: (client: PgClient) => Promise<T>): Promise<T> {
    // Inlined into SQL text, so it must be exactly a UUID (it comes from our own verified token).
    if (!UUID.test(userId)) throw new Error('user id must be a lower-case UUID');
    const runner = this.dataSource.createQueryRunner();
    await runner.connect();
    const client = (runner as unknown as { databaseConnection: PgClient }).databaseConnection;
    try {
      await client.query(`BEGIN; SELECT pg_advisory_xact_lock(hashtextextended('${userId}', 0))`);
      const result = await work(client);
      await client.query('COMMIT');
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
   * whole rows.
   */
  async pull(userId: string, sinceSeq: number, limit: number): Promise<PulledPage> {
    const rows: { collection: string; seq: string; row: Record<string, unknown> }[] = await this.dataSource.query(PULL_SQL, [
      userId,
      sinceSeq,
      limit + 1,
    ]);
    const changes: PulledChange[] = [];
    let lastSeq = sinceSeq;
    let taken = 0;
    for (const { collection, seq, row } of rows) {
      const pieces = rowFields(collection, row);
      if (taken > 0 && changes.length + pieces.length > limit) break;
      changes.push(...pieces);
      lastSeq = Number(seq);
      taken++;
    }
    return { changes: await TextStore.withStates(queryableOf(this.dataSource), userId, changes), lastSeq, hasMore: taken < rows.length };
  }

}

function rowFields(collection: string, row: Record<string, unknown>): PulledChange[] {
  const spec = collectionSpec(collection)!;
  const clocks = row['clocks'] as Record<string, string>;
  const rowId = row['id'] as string;
  return Object.keys(spec.fields)
    .filter((field) => clocks[field] !== undefined)
    .map((field) => ({ collection, rowId, field, value: row[columnName(field)] ?? null, hlc: clocks[field]! }));
}
