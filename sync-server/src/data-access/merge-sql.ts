import type { CollectionSpec } from '../../../shared/sync/schema/collection';
import { columnName } from '../../../shared/sync/schema/field';

/**
 * SQL that merges a batch of row pieces into one collection's table with the per-field
 * last-writer-wins rule of shared/sync/merge.ts, set-based, in one statement. Only `fields`
 * (those the batch touches; all by default) are read and compared: a device's batch touches a
 * few of a book's forty fields, and the others keep their values (or stay NULL in a new row)
 * without a clock comparison each.
 *
 * Input `$2` is a JSON array with one object per row: `id`, the new value of each field the batch
 * touches (keyed by column name) and `clocks` (field → HLC) for those fields only. A field's
 * value is taken when its clock is greater than the stored one; an absent field has no clock and
 * keeps its value. Rows where nothing wins are not written at all (a re-sent batch costs a read).
 * Clocks compare with COLLATE "C", byte for byte, exactly as JavaScript compares strings,
 * whatever the database's locale. The statement answers how many field values won; the caller
 * holds the user's advisory lock, so the clocks read in `decided` are still current.
 */
export function mergeSql(spec: CollectionSpec, fields: readonly string[] = Object.keys(spec.fields)): string {
  const column = (field: string) => columnName(field);
  const recordColumns = fields.map((field) => `${column(field)} ${spec.fields[field]!.sqlType}`).join(', ');
  const beats = (field: string, incoming: string, stored: string) =>
    `coalesce((${incoming}->>'${field}') COLLATE "C" > coalesce(${stored}->>'${field}', '') COLLATE "C", false)`;
  const anyWins = (incoming: string, stored: string) => fields.map((field) => beats(field, incoming, stored)).join(' OR ');
  const newer = (field: string) => beats(field, 'excluded.clocks', 't.clocks');
  return `
    WITH input AS (
      SELECT r.*, nextval('sync_seq') AS seq
        FROM jsonb_to_recordset($2::jsonb) AS r(id uuid, ${recordColumns}, clocks jsonb)
    ), decided AS (
      -- A scalar subquery is never flattened into a join: one primary-key probe per row, even
      -- while statistics lag behind a big first sync (a join was planned as a scan of all the
      -- reader's rows then).
      SELECT i.*, (SELECT t.clocks FROM ${spec.table} t WHERE t.user_id = $1::uuid AND t.id = i.id) AS stored_clocks
        FROM input i
    ), merged AS (
      INSERT INTO ${spec.table} AS t (user_id, id, ${fields.map(column).join(', ')}, clocks, seq)
      SELECT $1::uuid, d.id, ${fields.map((field) => `d.${column(field)}`).join(', ')}, d.clocks, d.seq
        FROM decided d
       WHERE d.stored_clocks IS NULL OR ${anyWins('d.clocks', 'd.stored_clocks')}
      ON CONFLICT (user_id, id) DO UPDATE SET
        ${fields.map((field) => `${column(field)} = CASE WHEN ${newer(field)} THEN excluded.${column(field)} ELSE t.${column(field)} END`).join(',\n        ')},
        clocks = t.clocks || jsonb_strip_nulls(jsonb_build_object(${fields
          .map((field) => `'${field}', CASE WHEN ${newer(field)} THEN excluded.clocks->'${field}' END`)
          .join(', ')})),
        seq = excluded.seq
      RETURNING 1
    )
    SELECT (SELECT count(*) FROM merged)::int AS rows,
           (SELECT sum(${fields.map((field) => `${beats(field, 'd.clocks', 'd.stored_clocks')}::int`).join(' + ')}) FROM decided d)::int AS won`;
}

/** Rows changed after a sequence, across every collection, in sequence order. */
export function pullSql(specs: readonly CollectionSpec[]): string {
  const parts = specs.map(
    (spec) => `SELECT '${spec.name}' AS collection, t.seq, to_jsonb(t) AS row FROM ${spec.table} t WHERE t.user_id = $1 AND t.seq > $2`,
  );
  return `SELECT collection, seq, row FROM (${parts.join(' UNION ALL ')}) changed ORDER BY seq LIMIT $3`;
}
