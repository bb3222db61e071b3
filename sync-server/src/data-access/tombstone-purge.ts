import type { CollectionSpec } from '../../../shared/sync/schema/collection';
import { COLLECTIONS } from '../../../shared/sync/schema/collections';
import { columnName } from '../../../shared/sync/schema/field';
import { purgeCutoffClock } from '../../../shared/trash/tombstone';
import type { Queryable } from './text-store';

/**
 * One statement per synced table that empties up to `$2` rows deleted before the cutoff clock
 * `$1`: every field's value and set state goes, while the id, the tombstone and the clocks stay.
 * A field clock older than the delete is raised to the delete's clock, so a device that comes back
 * late with an edit made before the delete loses it field by field too and cannot put purged
 * content back (one with a later edit finds the row still deleted; the next run empties it
 * again). `seq` is left alone:
 * nothing new to pull, and devices that hold the row keep what Trash showed them. The row's
 * mergeable texts' states and history go too.
 */
function purgeStatement(spec: CollectionSpec): string {
  const columns = Object.keys(spec.fields)
    .filter((field) => field !== 'deleted')
    .map(columnName);
  const holdsContent = [...columns.map((column) => `${column} IS NOT NULL`), `sets <> '{}'::jsonb`].join(' OR ');
  const byRow = (alias: string) => `${alias}.user_id = p.user_id AND ${alias}.collection = '${spec.name}' AND ${alias}.row_id = p.id`;
  return `
    WITH doomed AS (
      SELECT user_id, id FROM ${spec.table}
       WHERE deleted IS TRUE AND (clocks->>'deleted') COLLATE "C" < $1 AND (${holdsContent})
       LIMIT $2
    ), purged AS (
      UPDATE ${spec.table} t SET ${columns.map((column) => `${column} = NULL`).join(', ')}, sets = '{}'::jsonb,
             clocks = (SELECT jsonb_object_agg(c.field, CASE WHEN c.hlc COLLATE "C" >= (t.clocks->>'deleted') COLLATE "C" THEN c.hlc ELSE t.clocks->>'deleted' END)
                         FROM jsonb_each_text(t.clocks) AS c(field, hlc))
        FROM doomed d WHERE t.user_id = d.user_id AND t.id = d.id
      RETURNING t.user_id, t.id
    ), states AS (
      DELETE FROM text_states s USING purged p WHERE ${byRow('s')}
    ), versions AS (
      DELETE FROM text_versions v USING purged p WHERE ${byRow('v')}
    )
    SELECT count(*)::int AS purged FROM purged`;
}

const STATEMENTS = Object.values(COLLECTIONS).map(purgeStatement);

/**
 * Purges the content of rows deleted more than 30 days before `nowMs` (see
 * shared/trash/tombstone.ts), at most `limit` rows per table; returns how many it purged.
 */
export async function purgeTombstones(db: Queryable, nowMs: number, limit = 1000): Promise<number> {
  const cutoff = purgeCutoffClock(nowMs);
  let total = 0;
  for (const statement of STATEMENTS) {
    const { rows } = await db.query(statement, [cutoff, limit]);
    total += Number(rows[0]?.['purged'] ?? 0);
  }
  return total;
}
