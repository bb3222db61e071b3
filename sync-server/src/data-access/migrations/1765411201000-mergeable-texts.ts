import type { MigrationInterface, QueryRunner } from 'typeorm';

import { initialTextState } from '../../../../shared/text/initial-text-state';
import { textDocName } from '../../../../shared/text/text-doc';

/**
 * The fields that became mergeable texts in this migration, by table and column. Written out
 * rather than read from the schema, so this migration keeps meaning what it meant.
 */
const MIGRATED = [
  ['readings', 'readings', 'review', 'review'],
  ['readings', 'readings', 'takeaways', 'takeaways'],
  ['series', 'series', 'review', 'review'],
  ['quotes', 'quotes', 'note', 'note'],
  ['notebookPages', 'notebook_pages', 'body', 'body'],
  ['pageTemplates', 'page_templates', 'body', 'body'],
  ['sessions', 'sessions', 'note', 'note'],
] as const;

/**
 * Long texts merge per character (Yjs): one compact state per text (`text_states`), the text's
 * versions for its history (`text_versions`), and every existing plain text turned into the
 * same initial state the devices compute, so nothing doubles when they meet.
 */
export class MergeableTexts1765411201000 implements MigrationInterface {
  name = 'MergeableTexts1765411201000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE text_states (
        user_id uuid NOT NULL REFERENCES users (id) ON DELETE CASCADE,
        collection text NOT NULL,
        row_id uuid NOT NULL,
        field text NOT NULL,
        state bytea NOT NULL,
        updated_at timestamptz NOT NULL DEFAULT now(),
        compacted_at timestamptz,
        PRIMARY KEY (user_id, collection, row_id, field)
      )`);
    // The compaction job looks for states changed since they were last compacted.
    await queryRunner.query('CREATE INDEX text_states_to_compact_idx ON text_states (updated_at) WHERE compacted_at IS NULL');
    await queryRunner.query(`
      CREATE TABLE text_versions (
        user_id uuid NOT NULL REFERENCES users (id) ON DELETE CASCADE,
        collection text NOT NULL,
        row_id uuid NOT NULL,
        field text NOT NULL,
        period timestamptz NOT NULL,
        saved_at timestamptz NOT NULL,
        text text NOT NULL,
        PRIMARY KEY (user_id, collection, row_id, field, period)
      )`);
    await queryRunner.query('CREATE INDEX text_versions_saved_at_idx ON text_versions (saved_at)');
    for (const [collection, table, field, column] of MIGRATED) {
      const rows: { user_id: string; id: string; text: string }[] = await queryRunner.query(
        `SELECT user_id, id, ${column} AS text FROM ${table} WHERE ${column} IS NOT NULL AND ${column} <> ''`,
      );
      for (const row of rows) {
        const state = initialTextState(textDocName(collection, row.id, field), row.text);
        await queryRunner.query(`INSERT INTO text_states (user_id, collection, row_id, field, state, compacted_at) VALUES ($1, $2, $3, $4, $5, now())`, [
          row.user_id,
          collection,
          row.id,
          field,
          Buffer.from(state),
        ]);
      }
    }
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP TABLE text_versions');
    await queryRunner.query('DROP TABLE text_states');
  }
}
