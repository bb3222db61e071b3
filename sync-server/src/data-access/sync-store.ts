import type { DataSource, EntityManager } from 'typeorm';

import type { FieldChange, PulledChange } from '../../../shared/sync/field-change';
import { wins } from '../../../shared/sync/merge';
import { columnName } from '../../../shared/sync/schema/field';
import { COLLECTIONS, collectionSpec } from '../../../shared/sync/schema/collections';
import { mergeSql, pullSql } from './merge-sql';

/** Applied change ids are kept this long; a batch re-sent later still merges as a no-op. */
const APPLIED_IDS_KEPT_DAYS = 30;

const SPECS = Object.values(COLLECTIONS);
const MERGE_SQL = new Map(SPECS.map((spec) => [spec.name, mergeSql(spec)]));
const PULL_SQL = pullSql(SPECS);

/** One row's pieces from a batch: the winning value and clock of each field it touches. */
interface RowPieces {
  id: string;
  vals: Record<string, unknown>;
  clocks: Record<string, string>;
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
   * Applies a validated batch in one transaction. Each user's writes are serialised by a
   * transaction-level advisory lock, so sequence numbers commit in the order they were taken
   * and a pull cursor can never step over a change that commits later.
   */
  async push(userId: string, changes: readonly FieldChange[]): Promise<{ applied: number; duplicates: number }> {
    return this.dataSource.transaction(async (manager) => {
      await manager.query('SELECT pg_advisory_xact_lock(hashtextextended($1, 0))', [userId]);
      const fresh = await this.claimChangeIds(manager, userId, changes);
      const byCollection = new Map<string, Map<string, RowPieces>>();
      for (const change of fresh) {
        const rows = byCollection.get(change.collection) ?? new Map<string, RowPieces>();
        byCollection.set(change.collection, rows);
        const row = rows.get(change.rowId) ?? { id: change.rowId, vals: {}, clocks: {} };
        rows.set(change.rowId, row);
        // One statement may not touch a row twice: reduce the batch to one winner per field first.
        if (wins(change.hlc, row.clocks[change.field])) {
          row.vals[change.field] = change.value;
          row.clocks[change.field] = change.hlc;
        }
      }
      for (const [collection, rows] of byCollection) {
        await manager.query(MERGE_SQL.get(collection)!, [userId, JSON.stringify([...rows.values()])]);
      }
      return { applied: fresh.length, duplicates: changes.length - fresh.length };
    });
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
    return { changes, lastSeq, hasMore: taken < rows.length };
  }

  /** Records the batch's change ids; returns the changes whose id was not seen before. */
  private async claimChangeIds(manager: EntityManager, userId: string, changes: readonly FieldChange[]): Promise<FieldChange[]> {
    await manager.query(
      `DELETE FROM applied_changes WHERE user_id = $1 AND applied_at < now() - make_interval(days => $2)`,
      [userId, APPLIED_IDS_KEPT_DAYS],
    );
    const claimed: { change_id: string }[] = await manager.query(
      `INSERT INTO applied_changes (user_id, change_id) SELECT $1, unnest($2::uuid[])
       ON CONFLICT DO NOTHING RETURNING change_id`,
      [userId, changes.map((change) => change.id)],
    );
    const fresh = new Set(claimed.map((row) => row.change_id));
    // A change id repeated inside one batch counts once.
    return changes.filter((change) => fresh.delete(change.id.toLowerCase()));
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
