import type { CollectionSpec } from '../../../shared/sync/schema/collection';
import { columnName, type FieldSpec } from '../../../shared/sync/schema/field';

/**
 * SQL that merges a batch of row pieces into one collection's table with the per-field
 * last-writer-wins rule of shared/sync/merge.ts, in one set-based upsert.
 *
 * Input `$2` is a JSON array of `{ id, vals, clocks }`: for each row, the new values and clocks of
 * the fields this batch touches (already reduced to one per field). A field's value is taken only
 * when its clock is greater than the stored one. Clocks compare with COLLATE "C" so the database
 * orders them byte for byte, exactly as JavaScript compares strings, whatever its locale.
 */
export function mergeSql(spec: CollectionSpec): string {
  const fields = Object.keys(spec.fields);
  const columns = fields.map(columnName);
  const newer = (fieldName: string) =>
    `(excluded.clocks->>'${fieldName}') COLLATE "C" > coalesce(t.clocks->>'${fieldName}', '') COLLATE "C"`;
  const winners = `FROM jsonb_each_text(excluded.clocks) AS e(k, v) WHERE e.v COLLATE "C" > coalesce(t.clocks->>e.k, '') COLLATE "C"`;
  return `
    WITH input AS (
      SELECT r.id, r.vals, r.clocks, nextval('sync_seq') AS seq
        FROM jsonb_to_recordset($2::jsonb) AS r(id uuid, vals jsonb, clocks jsonb)
    )
    INSERT INTO ${spec.name} AS t (user_id, id, ${columns.join(', ')}, clocks, seq)
    SELECT $1::uuid, i.id, ${fields.map((name) => valueFromJson(name, spec.fields[name]!)).join(', ')}, i.clocks, i.seq
      FROM input i
    ON CONFLICT (user_id, id) DO UPDATE SET
      ${fields.map((name, n) => `${columns[n]} = CASE WHEN ${newer(name)} THEN excluded.${columns[n]} ELSE t.${columns[n]} END`).join(',\n      ')},
      clocks = t.clocks || coalesce((SELECT jsonb_object_agg(e.k, e.v) ${winners}), '{}'),
      seq = CASE WHEN EXISTS (SELECT 1 ${winners}) THEN excluded.seq ELSE t.seq END`;
}

/** A field's value out of the `vals` JSON, cast to its column type. */
function valueFromJson(fieldName: string, field: FieldSpec): string {
  const json = `i.vals->'${fieldName}'`;
  const text = `i.vals->>'${fieldName}'`;
  switch (field.sqlType) {
    case 'text':
      return `(${text})`;
    case 'text[]':
      return `CASE WHEN jsonb_typeof(${json}) = 'array' THEN ARRAY(SELECT jsonb_array_elements_text(${json})) END`;
    case 'double precision':
    case 'integer':
    case 'boolean':
    case 'uuid':
      return `(${text})::${field.sqlType}`;
    case 'jsonb':
      return `NULLIF(${json}, 'null'::jsonb)`;
  }
}

/** Rows changed after a sequence, across every collection, in sequence order. */
export function pullSql(specs: readonly CollectionSpec[]): string {
  const parts = specs.map(
    (spec) => `SELECT '${spec.name}' AS collection, t.seq, to_jsonb(t) AS row FROM ${spec.name} t WHERE t.user_id = $1 AND t.seq > $2`,
  );
  return `SELECT collection, seq, row FROM (${parts.join(' UNION ALL ')}) changed ORDER BY seq LIMIT $3`;
}
