import type { MigrationInterface, QueryRunner } from 'typeorm';

export class CreateSync1764806400000 implements MigrationInterface {
  name = 'CreateSync1764806400000';

  async up(queryRunner: QueryRunner): Promise<void> {
    // One sequence for every synced table: pulls page through all collections in one order.
    await queryRunner.query('CREATE SEQUENCE sync_seq AS bigint');
    await queryRunner.query(`
      CREATE TABLE books (
        user_id uuid NOT NULL REFERENCES users (id) ON DELETE CASCADE,
        id uuid NOT NULL,
        title text,
        authors text[],
        format text,
        status text,
        rating double precision,
        page_count integer,
        isbn text,
        deleted boolean,
        clocks jsonb NOT NULL DEFAULT '{}',
        seq bigint NOT NULL,
        PRIMARY KEY (user_id, id)
      )`);
    await queryRunner.query('CREATE INDEX books_user_seq_idx ON books (user_id, seq)');
    // Change ids already applied, so a re-sent batch is a no-op; old ones are pruned.
    await queryRunner.query(`
      CREATE TABLE applied_changes (
        user_id uuid NOT NULL REFERENCES users (id) ON DELETE CASCADE,
        change_id uuid NOT NULL,
        applied_at timestamptz NOT NULL DEFAULT now(),
        PRIMARY KEY (user_id, change_id)
      )`);
    await queryRunner.query('CREATE INDEX applied_changes_age_idx ON applied_changes (user_id, applied_at)');
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP TABLE applied_changes');
    await queryRunner.query('DROP TABLE books');
    await queryRunner.query('DROP SEQUENCE sync_seq');
  }
}
