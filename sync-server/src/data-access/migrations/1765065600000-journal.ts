import type { MigrationInterface, QueryRunner } from 'typeorm';

import { SYNCED_ROW_COLUMNS } from './synced-row-columns';

/** The journal: series, quotes, notebooks and templates, favourites, picks of the month, labels. */
export class Journal1765065600000 implements MigrationInterface {
  name = 'Journal1765065600000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      ALTER TABLE books
        ADD COLUMN label_ids text[],
        ADD COLUMN series_id uuid,
        ADD COLUMN series_position double precision,
        ADD COLUMN dnf_progress double precision,
        ADD COLUMN dnf_unit text,
        ADD COLUMN dnf_on text,
        ADD COLUMN dnf_reason text,
        ADD COLUMN wish_priority text,
        ADD COLUMN wish_where text,
        ADD COLUMN wish_price_note text,
        ADD COLUMN release_date text,
        ADD COLUMN preordered boolean`);
    await queryRunner.query(`CREATE TABLE series (name text, planned_count integer, review text, rating double precision, ${SYNCED_ROW_COLUMNS})`);
    await queryRunner.query('CREATE INDEX series_user_seq_idx ON series (user_id, seq) WHERE seq IS NOT NULL');
    await queryRunner.query(
      `CREATE TABLE quotes (book_id uuid, text text, page integer, ebook_location text, audio_seconds integer, chapter text, note text, tags text[], label_ids text[], favourite boolean, captured_at text, ${SYNCED_ROW_COLUMNS})`,
    );
    await queryRunner.query('CREATE INDEX quotes_user_seq_idx ON quotes (user_id, seq) WHERE seq IS NOT NULL');
    await queryRunner.query(`CREATE TABLE notebooks (title text, book_id uuid, ${SYNCED_ROW_COLUMNS})`);
    await queryRunner.query('CREATE INDEX notebooks_user_seq_idx ON notebooks (user_id, seq) WHERE seq IS NOT NULL');
    await queryRunner.query(`CREATE TABLE notebook_pages (notebook_id uuid, title text, body text, position double precision, ${SYNCED_ROW_COLUMNS})`);
    await queryRunner.query('CREATE INDEX notebook_pages_user_seq_idx ON notebook_pages (user_id, seq) WHERE seq IS NOT NULL');
    await queryRunner.query(`CREATE TABLE page_templates (name text, title text, body text, ${SYNCED_ROW_COLUMNS})`);
    await queryRunner.query('CREATE INDEX page_templates_user_seq_idx ON page_templates (user_id, seq) WHERE seq IS NOT NULL');
    await queryRunner.query(`CREATE TABLE favourites (kind text, book_id uuid, quote_id uuid, author_name text, why text, ${SYNCED_ROW_COLUMNS})`);
    await queryRunner.query('CREATE INDEX favourites_user_seq_idx ON favourites (user_id, seq) WHERE seq IS NOT NULL');
    await queryRunner.query(`CREATE TABLE month_picks (month text, book_id uuid, why text, ${SYNCED_ROW_COLUMNS})`);
    await queryRunner.query('CREATE INDEX month_picks_user_seq_idx ON month_picks (user_id, seq) WHERE seq IS NOT NULL');
    await queryRunner.query(`CREATE TABLE labels (name text, colour text, icon text, ${SYNCED_ROW_COLUMNS})`);
    await queryRunner.query('CREATE INDEX labels_user_seq_idx ON labels (user_id, seq) WHERE seq IS NOT NULL');
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP TABLE labels');
    await queryRunner.query('DROP TABLE month_picks');
    await queryRunner.query('DROP TABLE favourites');
    await queryRunner.query('DROP TABLE page_templates');
    await queryRunner.query('DROP TABLE notebook_pages');
    await queryRunner.query('DROP TABLE notebooks');
    await queryRunner.query('DROP TABLE quotes');
    await queryRunner.query('DROP TABLE series');
    await queryRunner.query(`
      ALTER TABLE books DROP COLUMN label_ids, DROP COLUMN series_id, DROP COLUMN series_position,
        DROP COLUMN dnf_progress, DROP COLUMN dnf_unit, DROP COLUMN dnf_on, DROP COLUMN dnf_reason,
        DROP COLUMN wish_priority, DROP COLUMN wish_where, DROP COLUMN wish_price_note,
        DROP COLUMN release_date, DROP COLUMN preordered`);
  }
}
