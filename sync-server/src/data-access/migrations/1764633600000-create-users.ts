import type { MigrationInterface, QueryRunner } from 'typeorm';

export class CreateUsers1764633600000 implements MigrationInterface {
  name = 'CreateUsers1764633600000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE users (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        email text NOT NULL UNIQUE CHECK (email = lower(email)),
        display_name text NOT NULL,
        password_hash text NOT NULL,
        role text NOT NULL DEFAULT 'reader' CHECK (role IN ('reader', 'admin')),
        disabled_at timestamptz,
        created_at timestamptz NOT NULL DEFAULT now(),
        last_seen_at timestamptz
      )`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP TABLE users');
  }
}
