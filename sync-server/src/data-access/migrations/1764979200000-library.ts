import type { MigrationInterface, QueryRunner } from 'typeorm';

import { SYNCED_ROW_COLUMNS } from './synced-row-columns';

/** The library: more about each book, its status history, and readings with their reviews. */
export class Library1764979200000 implements MigrationInterface {
  name = 'Library1764979200000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      ALTER TABLE books
        ADD COLUMN subtitle text,
        ADD COLUMN audio_minutes integer,
        ADD COLUMN publisher text,
        ADD COLUMN year integer,
        ADD COLUMN language text,
        ADD COLUMN genres text[],
        ADD COLUMN tags text[],
        ADD COLUMN status_changed_at text,
        ADD COLUMN copy text,
        ADD COLUMN cover_id text`);
    await queryRunner.query(`CREATE TABLE book_status_changes (book_id uuid, status text, changed_at text, ${SYNCED_ROW_COLUMNS})`);
    await queryRunner.query(`
      CREATE TABLE readings (
        book_id uuid, started_on text, finished_on text, rating double precision, summary text,
        review text, takeaways text, recommend text, recommend_to text, ${SYNCED_ROW_COLUMNS})`);
    // Partial on purpose, like books_user_seq_idx: never chosen for a primary-key lookup.
    for (const table of ['book_status_changes', 'readings']) {
      await queryRunner.query(`CREATE INDEX ${table}_user_seq_idx ON ${table} (user_id, seq) WHERE seq IS NOT NULL`);
    }
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP TABLE readings');
    await queryRunner.query('DROP TABLE book_status_changes');
    await queryRunner.query(`
      ALTER TABLE books DROP COLUMN subtitle, DROP COLUMN audio_minutes, DROP COLUMN publisher,
        DROP COLUMN year, DROP COLUMN language, DROP COLUMN genres, DROP COLUMN tags,
        DROP COLUMN status_changed_at, DROP COLUMN copy, DROP COLUMN cover_id`);
  }
}
