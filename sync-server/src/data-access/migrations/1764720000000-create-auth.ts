import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * What refresh tokens and reset links have alike (entities/single-use-secret.ts): the secret's
 * SHA-256, when it was made, when it lapses, and when it was used.
 */
const SINGLE_USE_SECRET_COLUMNS = `token_hash text NOT NULL UNIQUE,
        created_at timestamptz NOT NULL DEFAULT now(),
        expires_at timestamptz NOT NULL,
        used_at timestamptz`;

export class CreateAuth1764720000000 implements MigrationInterface {
  name = 'CreateAuth1764720000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE device_sessions (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        user_id uuid NOT NULL REFERENCES users (id) ON DELETE CASCADE,
        name text NOT NULL,
        user_agent text NOT NULL DEFAULT '',
        created_at timestamptz NOT NULL DEFAULT now(),
        last_seen_at timestamptz NOT NULL DEFAULT now(),
        revoked_at timestamptz
      )`);
    await queryRunner.query('CREATE INDEX device_sessions_user_idx ON device_sessions (user_id)');
    await queryRunner.query(`
      CREATE TABLE refresh_tokens (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        session_id uuid NOT NULL REFERENCES device_sessions (id) ON DELETE CASCADE,
        ${SINGLE_USE_SECRET_COLUMNS}
      )`);
    await queryRunner.query('CREATE INDEX refresh_tokens_session_idx ON refresh_tokens (session_id)');
    await queryRunner.query(`
      CREATE TABLE password_resets (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        user_id uuid NOT NULL REFERENCES users (id) ON DELETE CASCADE,
        ${SINGLE_USE_SECRET_COLUMNS}
      )`);
    await queryRunner.query('CREATE INDEX password_resets_user_idx ON password_resets (user_id)');
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP TABLE password_resets');
    await queryRunner.query('DROP TABLE refresh_tokens');
    await queryRunner.query('DROP TABLE device_sessions');
  }
}
