import type { DataSource, EntityManager } from 'typeorm';

import { SHARED_PROGRESS_FIELDS } from '../../../shared/circles/circle-collections';
import { writeRefusal } from '../../../shared/circles/circle-permissions';
import type { CircleRole } from '../../../shared/circles/circle-roles';
import { NOT_A_MEMBER, NOT_A_MEMBER_TEXT, type CirclePulledRow } from '../../../shared/circles/circle-wire';
import type { ChangeProblem, FieldChange, PushResponse } from '../../../shared/api/sync';
import { mergeField, type Stamped } from '../../../shared/sync/merge';
import { AppError } from '../errors';

/** A `circle_rows` row as PostgreSQL answers it (`seq` a bigint, so text). */
interface CircleRowRecord {
  collection: string;
  id: string;
  circle_id: string;
  author_id: string;
  fields: Record<string, unknown>;
  clocks: Record<string, string>;
  seq: string;
}

/** A stored circle row: each field's value and clock. */
interface StoredRow {
  collection: string;
  id: string;
  circleId: string;
  authorId: string;
  fields: Record<string, unknown>;
  clocks: Record<string, string>;
  changed: boolean;
}

export const notAMember = () => new AppError(403, NOT_A_MEMBER, NOT_A_MEMBER_TEXT);

/** The caller's role in a circle, read inside `manager`'s transaction; 403 when they are not in it. */
export async function roleIn(manager: Pick<EntityManager, 'query'>, circleId: string, userId: string, lock = false): Promise<CircleRole> {
  const rows: { role: CircleRole }[] = await manager.query(`SELECT role FROM circle_members WHERE circle_id = $1 AND user_id = $2${lock ? ' FOR SHARE' : ''}`, [
    circleId,
    userId,
  ]);
  if (!rows[0]) throw notAMember();
  return rows[0].role;
}

/**
 * Circle data, merged per field with the shared rule (shared/sync/merge.ts: the greater clock
 * wins, ties by value) and read back by circle. Each circle's pushes take a transaction-level
 * advisory lock, so its change numbers commit in order and a pull cursor never skips a row.
 * Membership is checked inside the same transaction as the work: a member removed a moment
 * before gets nothing more and writes nothing.
 */
export class CircleSyncStore {
  constructor(private readonly dataSource: DataSource) {}

  async push(circleId: string, userId: string, changes: readonly FieldChange[]): Promise<Omit<PushResponse, 'serverTime'>> {
    return this.dataSource.transaction(async (manager) => {
      await manager.query(`SELECT pg_advisory_xact_lock(hashtextextended('circle:' || $1, 0))`, [circleId]);
      const role = await roleIn(manager, circleId, userId, true);
      const rows = await loadRows(manager, changes);
      const problems: ChangeProblem[] = [];
      for (const [index, change] of changes.entries()) {
        const key = `${change.collection}/${change.rowId}`;
        let row = rows.get(key);
        // A row of another circle is answered like a row the caller may not write: nothing about it is told.
        if (row && row.circleId !== circleId) {
          problems.push({ index, id: change.id, code: 'not_allowed', reason: 'this row belongs to another circle' });
          continue;
        }
        const refusal = writeRefusal(change, { circleId, role, callerId: userId, authorId: row?.authorId });
        if (refusal) {
          problems.push({ index, id: change.id, ...refusal });
          continue;
        }
        if (!row) {
          row = { collection: change.collection, id: change.rowId, circleId, authorId: userId, fields: {}, clocks: {}, changed: false };
          rows.set(key, row);
        }
      }
      if (problems.length > 0) throw new AppError(403, 'not_allowed', `${problems.length} of ${changes.length} changes are not yours to make`, problems);
      return mergeInto(manager, rows, changes);
    });
  }

  /** Rows of the circle changed after `sinceSeq`, whole, in change order; another member's progress only as far as they share it. */
  async pull(
    circleId: string,
    userId: string,
    sinceSeq: number,
    limit: number,
  ): Promise<{ rows: CirclePulledRow[]; lastSeq: number; hasMore: boolean; role: CircleRole }> {
    return this.dataSource.transaction('REPEATABLE READ', async (manager) => {
      const role = await roleIn(manager, circleId, userId);
      const stored: (Omit<CircleRowRecord, 'circle_id'> & { member: boolean })[] = await manager.query(
        `SELECT r.collection, r.id, r.author_id, r.fields, r.clocks, r.seq,
                  EXISTS (SELECT 1 FROM circle_members m WHERE m.circle_id = r.circle_id AND m.user_id = r.author_id) AS member
             FROM circle_rows r WHERE r.circle_id = $1 AND r.seq > $2 ORDER BY r.seq LIMIT $3`,
        [circleId, sinceSeq, limit + 1],
      );
      const page = stored.slice(0, limit);
      const rows = page.flatMap((row) => {
        const fields = visibleFields(row.collection, row.fields, row.author_id === userId, row.member);
        if (!fields) return [];
        return [
          {
            collection: row.collection,
            id: row.id,
            authorId: row.author_id,
            fields: Object.fromEntries(fields.map((field) => [field, { value: row.fields[field] ?? null, hlc: row.clocks[field]! }])),
          },
        ];
      });
      return { rows, lastSeq: page.length ? Number(page.at(-1)!.seq) : sinceSeq, hasMore: stored.length > limit, role };
    });
  }
}

/**
 * The fields of a row a member may see. A reader's own progress row is theirs whole; another
 * member's only while they share it (`shareProgress`), and then only what sharing shows; a former
 * member's progress not at all.
 */
function visibleFields(collection: string, fields: Record<string, unknown>, own: boolean, authorIsMember: boolean): string[] | null {
  const all = Object.keys(fields);
  if (collection !== 'circleProgress' || own) return all;
  if (!authorIsMember || fields['shareProgress'] !== true) return null;
  return all.filter((field) => SHARED_PROGRESS_FIELDS.includes(field));
}

async function loadRows(manager: EntityManager, changes: readonly FieldChange[]): Promise<Map<string, StoredRow>> {
  const ids = [...new Set(changes.map((change) => change.rowId))];
  const rows: Omit<CircleRowRecord, 'seq'>[] =
    ids.length === 0
      ? []
      : await manager.query('SELECT collection, id, circle_id, author_id, fields, clocks FROM circle_rows WHERE id = ANY($1::uuid[]) FOR UPDATE', [ids]);
  return new Map(
    rows.map((row) => [
      `${row.collection}/${row.id}`,
      { collection: row.collection, id: row.id, circleId: row.circle_id, authorId: row.author_id, fields: row.fields, clocks: row.clocks, changed: false },
    ]),
  );
}

/** Folds the batch into the rows with the shared per-field merge, writes the rows that changed, and sorts the changes as a reader's push does. */
async function mergeInto(manager: EntityManager, rows: Map<string, StoredRow>, changes: readonly FieldChange[]): Promise<Omit<PushResponse, 'serverTime'>> {
  let applied = 0;
  let duplicates = 0;
  const overwritten: { id: string; by: string }[] = [];
  for (const change of changes) {
    const row = rows.get(`${change.collection}/${change.rowId}`)!;
    const stored: Stamped | undefined =
      row.clocks[change.field] === undefined ? undefined : { value: row.fields[change.field] ?? null, hlc: row.clocks[change.field]! };
    const merged = mergeField(stored, { value: change.value, hlc: change.hlc });
    if (stored && merged === stored) {
      if (stored.hlc === change.hlc) duplicates++;
      else overwritten.push({ id: change.id, by: stored.hlc });
      continue;
    }
    row.fields[change.field] = change.value;
    row.clocks[change.field] = change.hlc;
    row.changed = true;
    applied++;
  }
  for (const row of rows.values()) {
    if (!row.changed) continue;
    await manager.query(
      `INSERT INTO circle_rows (collection, id, circle_id, author_id, fields, clocks, seq)
       VALUES ($1, $2, $3, $4, $5, $6, nextval('circle_seq'))
       ON CONFLICT (collection, id) DO UPDATE SET fields = excluded.fields, clocks = excluded.clocks, seq = excluded.seq`,
      [row.collection, row.id, row.circleId, row.authorId, JSON.stringify(row.fields), JSON.stringify(row.clocks)],
    );
  }
  return { applied, duplicates, superseded: overwritten.length, overwritten };
}
