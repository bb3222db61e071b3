import type { MigrationInterface, QueryRunner } from 'typeorm';

export class CreateUploads1764892800000 implements MigrationInterface {
  name = 'CreateUploads1764892800000';

  async up(queryRunner: QueryRunner): Promise<void> {
    // Content-addressed: the id is the hex SHA-256 of the bytes, so an image is stored once
    // however many readers upload it.
    await queryRunner.query(`
      CREATE TABLE uploads (
        id text PRIMARY KEY CHECK (id ~ '^[0-9a-f]{64}$'),
        media_type text NOT NULL,
        byte_size integer NOT NULL CHECK (byte_size = octet_length(bytes)),
        bytes bytea NOT NULL,
        created_at timestamptz NOT NULL DEFAULT now()
      )`);
    // Who may read an upload. Deleting an account removes its rows here; the upload itself goes
    // when nobody owns it any more (domain/accounts.ts).
    await queryRunner.query(`
      CREATE TABLE upload_owners (
        upload_id text NOT NULL REFERENCES uploads (id) ON DELETE CASCADE,
        user_id uuid NOT NULL REFERENCES users (id) ON DELETE CASCADE,
        created_at timestamptz NOT NULL DEFAULT now(),
        PRIMARY KEY (upload_id, user_id)
      )`);
    await queryRunner.query('CREATE INDEX upload_owners_user_idx ON upload_owners (user_id)');
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP TABLE upload_owners');
    await queryRunner.query('DROP TABLE uploads');
  }
}
