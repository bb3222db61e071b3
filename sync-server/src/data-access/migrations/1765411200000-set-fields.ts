import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Set fields (tags, genres, label ids) merge per element: each synced row gets `sets`
 * (field → observed-remove state, shared/sync/or-set.ts) and three SQL functions mirror the
 * shared code. Lists stored before become states whose elements were all added at the field's
 * clock. The tables and fields are spelled out: a migration must keep meaning what it meant.
 */
const TABLES = [
  'books',
  'book_status_changes',
  'readings',
  'series',
  'quotes',
  'notebooks',
  'notebook_pages',
  'page_templates',
  'favourites',
  'month_picks',
  'labels',
  'sessions',
  'timers',
  'year_plans',
  'month_plans',
  'challenges',
];
export const SET_FIELDS: readonly [table: string, field: string, column: string][] = [
  ['books', 'genres', 'genres'],
  ['books', 'tags', 'tags'],
  ['books', 'labelIds', 'label_ids'],
  ['quotes', 'tags', 'tags'],
  ['quotes', 'labelIds', 'label_ids'],
];

export class SetFields1765411200000 implements MigrationInterface {
  name = 'SetFields1765411200000';

  async up(queryRunner: QueryRunner): Promise<void> {
    // Per device, the greater clock (byte order, as JavaScript compares these ASCII clocks).
    await queryRunner.query(`
      CREATE FUNCTION lamplight_clock_map_join(x jsonb, y jsonb) RETURNS jsonb
      LANGUAGE sql IMMUTABLE PARALLEL SAFE AS $$
        SELECT coalesce(jsonb_object_agg(node, clock), '{}'::jsonb)
          FROM (SELECT node, max(clock COLLATE "C") AS clock
                  FROM (SELECT key AS node, value AS clock FROM jsonb_each_text(coalesce(x, '{}'::jsonb))
                        UNION ALL
                        SELECT key, value FROM jsonb_each_text(coalesce(y, '{}'::jsonb))) both_sides
                 GROUP BY node) greatest
      $$`);
    await queryRunner.query(`
      CREATE FUNCTION lamplight_orset_join(x jsonb, y jsonb) RETURNS jsonb
      LANGUAGE sql IMMUTABLE PARALLEL SAFE AS $$
        SELECT coalesce(jsonb_object_agg(e.element, jsonb_build_object(
                 'a', lamplight_clock_map_join(x->e.element->'a', y->e.element->'a'),
                 'r', lamplight_clock_map_join(x->e.element->'r', y->e.element->'r'))), '{}'::jsonb)
          FROM (SELECT jsonb_object_keys(coalesce(x, '{}'::jsonb)) AS element
                UNION
                SELECT jsonb_object_keys(coalesce(y, '{}'::jsonb))) e
      $$`);
    // Elements with an add no remove has seen, in order of their first such add, then by text.
    await queryRunner.query(`
      CREATE FUNCTION lamplight_orset_elements(s jsonb) RETURNS text[]
      LANGUAGE sql IMMUTABLE PARALLEL SAFE AS $$
        SELECT coalesce(array_agg(element ORDER BY first_add COLLATE "C", element COLLATE "C"), '{}'::text[])
          FROM (SELECT e.key AS element,
                       (SELECT min(a.value COLLATE "C") FROM jsonb_each_text(e.value->'a') a
                         WHERE a.value COLLATE "C" > coalesce(e.value->'r'->>a.key, '') COLLATE "C") AS first_add
                  FROM jsonb_each(coalesce(s, '{}'::jsonb)) e) live
         WHERE first_add IS NOT NULL
      $$`);
    for (const table of TABLES) await queryRunner.query(`ALTER TABLE ${table} ADD COLUMN sets jsonb NOT NULL DEFAULT '{}'`);
    for (const [table, field, column] of SET_FIELDS) await queryRunner.query(listToStateSql(table, field, column));
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    for (const table of TABLES) await queryRunner.query(`ALTER TABLE ${table} DROP COLUMN sets`);
    await queryRunner.query('DROP FUNCTION lamplight_orset_elements(jsonb)');
    await queryRunner.query('DROP FUNCTION lamplight_orset_join(jsonb, jsonb)');
    await queryRunner.query('DROP FUNCTION lamplight_clock_map_join(jsonb, jsonb)');
  }
}

/** A stored list becomes a state whose elements were all added at the field's clock, by its device. */
export function listToStateSql(table: string, field: string, column: string): string {
  return `
    UPDATE ${table} SET sets = sets || jsonb_build_object('${field}', (
      SELECT coalesce(jsonb_object_agg(element, jsonb_build_object(
               'a', jsonb_build_object(split_part(clocks->>'${field}', ':', 3), clocks->>'${field}'),
               'r', '{}'::jsonb)), '{}'::jsonb)
        FROM unnest(${column}) AS element))
     WHERE ${column} IS NOT NULL AND clocks ? '${field}' AND NOT sets ? '${field}'`;
}
