import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Sign-in, registration and reset attempts per client, shared by every server instance. */
export class AttemptCounts1765324800000 implements MigrationInterface {
  name = 'AttemptCounts1765324800000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE attempt_counts (
        key text PRIMARY KEY,
        hits integer NOT NULL,
        reset_at timestamptz NOT NULL
      )`);
    await queryRunner.query('CREATE INDEX attempt_counts_reset_idx ON attempt_counts (reset_at)');
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP TABLE attempt_counts');
  }
}
