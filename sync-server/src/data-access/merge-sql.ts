import type { CollectionSpec } from '../../../shared/sync/schema/collection';
import { columnName } from '../../../shared/sync/schema/field';

/**
 * SQL that merges a batch of row pieces into one collection's table with the per-field
 * last-writer-wins rule of shared/sync/merge.ts, set-based, in one statement. Only `fields`
 * (those the batch touches; all by default) are read and compared: a device's batch touches a
 * few of a book's forty fields, and the others keep their values (or stay NULL in a new row)
 * without a clock comparison each.
 *
 * Input `$2` is a JSON array with one object per row: `id`, the new value of each last-writer-wins
 * field the batch touches (keyed by column name), `clocks` (field → HLC) for every touched field
 * and `sets` (set field → the delta to join, shared/sync/or-set.ts). A set field's column is
 * recomputed from its joined state by `lamplight_orset_elements`. A field's
 * value is taken when its clock is greater than the stored one; an absent field has no clock and
 * keeps its value. Rows where nothing wins are not written at all (a re-sent batch costs a read).
 * Clocks compare with COLLATE "C", byte for byte, exactly as JavaScript compares strings,
 * whatever the database's locale. The statement answers, for each row that existed, its clocks
 * before the merge (`c`) and the set fields that grew (`g`), so the caller can tell applied,
 * duplicate and superseded changes apart; it holds the user's advisory lock, so they are current.
 */
export function mergeSql(spec: CollectionSpec, fields: readonly string[] = Object.keys(spec.fields)): string {
  const column = (field: string) => columnName(field);
  const isSet = (field: string) => spec.fields[field]!.kind === 'set';
  const lww = fields.filter((field) => !isSet(field));
  const sets = fields.filter(isSet);
  const recordColumns = [...lww.map((field) => `${column(field)} ${spec.fields[field]!.sqlType}`), 'clocks jsonb', 'sets jsonb'].join(', ');
  const beats = (field: string, incoming: string, stored: string) =>
    `coalesce((${incoming}->>'${field}') COLLATE "C" > coalesce(${stored}->>'${field}', '') COLLATE "C", false)`;
  const joined = (field: string, incoming: string, stored: string) => `lamplight_orset_join(${stored}->'${field}', ${incoming}->'${field}')`;
  // A set field wins when the delta adds something its stored state lacks.
  const grows = (field: string, incoming: string, stored: string) =>
    `coalesce((${incoming} ? '${field}') AND ${joined(field, incoming, stored)} IS DISTINCT FROM coalesce(${stored}->'${field}', '{}'::jsonb), false)`;
  // Equal clocks are candidates too: the stored value is not read here, so the upsert decides.
  const candidate = (field: string) =>
    isSet(field)
      ? grows(field, 'd.sets', 'd.stored_sets')
      : `coalesce((d.clocks->>'${field}') COLLATE "C" >= coalesce(d.stored_clocks->>'${field}', '') COLLATE "C", false)`;
  const anyWins = fields.map(candidate).join(' OR ');
  // Greater clock, or an equal clock and a greater value as jsonb text (shared/sync/merge.ts, canonicalText).
  const newer = (field: string) =>
    `(${beats(field, 'excluded.clocks', 't.clocks')} OR coalesce((excluded.clocks->>'${field}') = (t.clocks->>'${field}') AND ` +
    `coalesce(to_jsonb(excluded.${column(field)})::text, 'null') COLLATE "C" > coalesce(to_jsonb(t.${column(field)})::text, 'null') COLLATE "C", false))`;
  const updateWhen = fields.map((field) => (isSet(field) ? grows(field, 'excluded.sets', 't.sets') : newer(field))).join(' OR ');
  const setColumnsOnInsert = sets.map((field) => `CASE WHEN d.sets ? '${field}' THEN lamplight_orset_elements(d.sets->'${field}') END`);
  const setsUpdate = sets.length
    ? `t.sets || jsonb_strip_nulls(jsonb_build_object(${sets
        .map((field) => `'${field}', CASE WHEN excluded.sets ? '${field}' THEN ${joined(field, 'excluded.sets', 't.sets')} END`)
        .join(', ')}))`
    : 't.sets';
  return `
    WITH input AS (
      SELECT r.*, nextval('sync_seq') AS seq
        FROM jsonb_to_recordset($2::jsonb) AS r(id uuid, ${recordColumns})
    ), decided AS (
      -- A scalar subquery is never flattened into a join: one primary-key probe per row, even
      -- while statistics lag behind a big first sync (a join was planned as a scan of all the
      -- reader's rows then). OFFSET 0 keeps probed a subquery of its own: pulled up, the probe
      -- ran once for each use of stored, three a row.
      SELECT probed.*, stored->'c' AS stored_clocks, stored->'s' AS stored_sets
        FROM (SELECT i.id, ${lww.map((field) => `i.${column(field)}, `).join('')}i.clocks, coalesce(i.sets, '{}'::jsonb) AS sets, i.seq,
                     (SELECT jsonb_build_object('c', t.clocks, 's', t.sets) FROM ${spec.table} t WHERE t.user_id = $1::uuid AND t.id = i.id) AS stored
                FROM input i OFFSET 0) probed
    ), merged AS (
      INSERT INTO ${spec.table} AS t (user_id, id, ${[...lww, ...sets].map(column).join(', ')}, clocks, sets, seq)
      SELECT $1::uuid, d.id, ${[...lww.map((field) => `d.${column(field)}`), ...setColumnsOnInsert].join(', ')}, d.clocks, d.sets, d.seq
        FROM decided d
       WHERE d.stored IS NULL OR ${anyWins}
      ON CONFLICT (user_id, id) DO UPDATE SET
        ${[
          ...lww.map((field) => `${column(field)} = CASE WHEN ${newer(field)} THEN excluded.${column(field)} ELSE t.${column(field)} END`),
          ...sets.map(
            (field) =>
              `${column(field)} = CASE WHEN excluded.sets ? '${field}' THEN lamplight_orset_elements(${joined(field, 'excluded.sets', 't.sets')}) ELSE t.${column(field)} END`,
          ),
        ].join(',\n        ')},
        clocks = t.clocks || jsonb_strip_nulls(jsonb_build_object(${fields
          .map((field) => `'${field}', CASE WHEN ${newer(field)} THEN excluded.clocks->'${field}' END`)
          .join(', ')})),
        sets = ${setsUpdate},
        seq = excluded.seq
      WHERE ${updateWhen}
      RETURNING 1
    )
    SELECT (SELECT count(*) FROM merged)::int AS rows,
           (SELECT json_object_agg(d.id, json_build_object('c', d.stored_clocks, 'g', json_build_array(${sets
             .map((field) => `CASE WHEN ${grows(field, 'd.sets', 'd.stored_sets')} THEN '${field}' END`)
             .join(', ')})))
              FROM decided d WHERE d.stored IS NOT NULL) AS before`;
}

/**
 * One collection's rows changed after a sequence, in sequence order (`$1` user, `$2` sequence,
 * `$3` rows at most, `$4` the greatest sequence to read): plain paging on the table's
 * (user_id, seq) index, with only the columns a pull sends: id, seq, clocks, sets, then the
 * fields in the schema's order (the store reads rows as arrays in this order). The
 * caller merges the collections' pages by sequence and builds the answer's JSON for the rows that
 * fit (see `SyncStore.pull`): a pull reads what a plain paging client would, and builds nothing in SQL.
 */
export function pullPageSql(spec: CollectionSpec): string {
  const columns = ['id', 'seq', 'clocks', 'sets', ...Object.keys(spec.fields).map(columnName)];
  return `SELECT ${columns.map((column) => `t.${column}`).join(', ')} FROM ${spec.table} t WHERE t.user_id = $1 AND t.seq > $2 AND t.seq <= $4 ORDER BY t.seq LIMIT $3`;
}

/**
 * Per collection (in the order of `specs`), the greatest sequence of a row changed after a
 * sequence, or null (`$1` user, `$2` sequence): one index-only probe per table on (user_id, seq).
 * Most pulls find none. The greatest of them bounds the pull's reads: a reader's pushes take the
 * reader's lock and commit in sequence order, so every row up to it has committed, and a push
 * committing while the tables are read (one query each) cannot show a later row of one table
 * while an earlier row of another stays unseen, which would let the cursor step over it.
 */
export function changedTablesSql(specs: readonly CollectionSpec[]): string {
  const probes = specs.map((spec) => `(SELECT max(t.seq) FROM ${spec.table} t WHERE t.user_id = $1 AND t.seq > $2)`);
  return `SELECT ARRAY[${probes.join(', ')}]::bigint[] AS latest`;
}

/**
 * How many rows changed after a sequence, across every collection (`$1` user, `$2` sequence):
 * index-only counts on (user_id, seq), run only while a pull has more pages, so a device can say
 * how far a long first sync has come.
 */
export function remainingSql(specs: readonly CollectionSpec[]): string {
  const counts = specs.map((spec) => `(SELECT count(*) FROM ${spec.table} t WHERE t.user_id = $1 AND t.seq > $2)`);
  return `SELECT (${counts.join(' + ')})::int AS remaining`;
}
