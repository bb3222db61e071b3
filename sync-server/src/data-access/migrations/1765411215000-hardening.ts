import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Issue 15: wrong-password counts per account (`password_failures`), e-mail verification
 * (`users.email_verified_at`) and the refresh-token grace window (`refresh_tokens.grace_used_at`).
 */
export class Hardening1765411215000 implements MigrationInterface {
  name = 'Hardening1765411215000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE password_failures (
        key text PRIMARY KEY,
        failures integer NOT NULL,
        locked_until timestamptz,
        updated_at timestamptz NOT NULL
      )`);
    await queryRunner.query('CREATE INDEX password_failures_updated_idx ON password_failures (updated_at)');
    await queryRunner.query('ALTER TABLE users ADD COLUMN email_verified_at timestamptz');
    await queryRunner.query('ALTER TABLE refresh_tokens ADD COLUMN grace_used_at timestamptz');
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('ALTER TABLE refresh_tokens DROP COLUMN grace_used_at');
    await queryRunner.query('ALTER TABLE users DROP COLUMN email_verified_at');
    await queryRunner.query('DROP TABLE password_failures');
  }
}
