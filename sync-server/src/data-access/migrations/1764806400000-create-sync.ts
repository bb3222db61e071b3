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
    // Pulls page by (user_id, seq). The index is partial on purpose: `seq IS NOT NULL` is always
    // true, but a lookup by primary key does not imply it, so the planner can never pick this
    // index for one (with stale statistics it once did, scanning all of a reader's rows per row).
    await queryRunner.query('CREATE INDEX books_user_seq_idx ON books (user_id, seq) WHERE seq IS NOT NULL');
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP TABLE books');
    await queryRunner.query('DROP SEQUENCE sync_seq');
  }
}
