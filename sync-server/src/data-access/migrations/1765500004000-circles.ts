import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Reading circles. `circles` and `circle_members` are the server's own (membership decides who
 * may read and write); `circle_rows` holds every circle collection's rows (shared/circles/
 * circle-collections.ts) by circle, each field's value and clock in jsonb, with a per-circle
 * change order from `circle_seq`. A row's `author_id` is its first writer and has no foreign
 * key: posts outlive their author's membership ("a former member").
 */
export class Circles1765500004000 implements MigrationInterface {
  name = 'Circles1765500004000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE circles (
        id uuid PRIMARY KEY,
        join_code text NOT NULL UNIQUE,
        created_at timestamptz NOT NULL DEFAULT now()
      )`);
    await queryRunner.query(`
      CREATE TABLE circle_members (
        circle_id uuid NOT NULL REFERENCES circles(id) ON DELETE CASCADE,
        user_id uuid NOT NULL REFERENCES users(id) ON DELETE CASCADE,
        role text NOT NULL CHECK (role IN ('host', 'member')),
        joined_at timestamptz NOT NULL DEFAULT now(),
        PRIMARY KEY (circle_id, user_id)
      )`);
    await queryRunner.query('CREATE INDEX circle_members_user_idx ON circle_members (user_id)');
    await queryRunner.query(`
      CREATE TABLE circle_invitations (
        id uuid PRIMARY KEY,
        circle_id uuid NOT NULL REFERENCES circles(id) ON DELETE CASCADE,
        email text NOT NULL,
        invited_by uuid REFERENCES users(id) ON DELETE SET NULL,
        created_at timestamptz NOT NULL DEFAULT now(),
        expires_at timestamptz NOT NULL,
        used_at timestamptz,
        used_by uuid REFERENCES users(id) ON DELETE SET NULL
      )`);
    await queryRunner.query('CREATE INDEX circle_invitations_circle_idx ON circle_invitations (circle_id)');
    await queryRunner.query('CREATE SEQUENCE circle_seq');
    await queryRunner.query(`
      CREATE TABLE circle_rows (
        collection text NOT NULL,
        id uuid NOT NULL,
        circle_id uuid NOT NULL REFERENCES circles(id) ON DELETE CASCADE,
        author_id uuid NOT NULL,
        fields jsonb NOT NULL DEFAULT '{}'::jsonb,
        clocks jsonb NOT NULL DEFAULT '{}'::jsonb,
        seq bigint NOT NULL,
        PRIMARY KEY (collection, id)
      )`);
    await queryRunner.query('CREATE INDEX circle_rows_seq_idx ON circle_rows (circle_id, seq)');
    // One reminder per reader per meeting, so a retried job run never mails twice.
    await queryRunner.query(`
      CREATE TABLE circle_reminders_sent (
        part_id uuid NOT NULL,
        user_id uuid NOT NULL,
        sent_at timestamptz NOT NULL DEFAULT now(),
        PRIMARY KEY (part_id, user_id)
      )`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP TABLE circle_reminders_sent, circle_rows, circle_invitations, circle_members, circles');
    await queryRunner.query('DROP SEQUENCE circle_seq');
  }
}
