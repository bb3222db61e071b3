import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Catalogue answers, shared by every reader (catalogue records are public): a key such as
 * `isbn:9781999990010` and the books found, until `expires_at`.
 */
export class CatalogueCache1765412022000 implements MigrationInterface {
  name = 'CatalogueCache1765412022000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE catalogue_cache (
        key text PRIMARY KEY,
        books jsonb NOT NULL,
        source text NOT NULL,
        fetched_at timestamptz NOT NULL DEFAULT now(),
        expires_at timestamptz NOT NULL
      )`);
    await queryRunner.query('CREATE INDEX catalogue_cache_expires_idx ON catalogue_cache (expires_at)');
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP TABLE catalogue_cache');
  }
}
