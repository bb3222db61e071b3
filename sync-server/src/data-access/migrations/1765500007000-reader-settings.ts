import type { MigrationInterface, QueryRunner } from 'typeorm';

import { SYNCED_ROW_COLUMNS } from './synced-row-columns';

/** The reader's synced settings: the locale dates are written in and the colour theme. */
export class ReaderSettings1765500007000 implements MigrationInterface {
  name = 'ReaderSettings1765500007000';

  async up(queryRunner: QueryRunner): Promise<void> {
    // `sets` as SetFields1765411200000 gave every synced table (SYNCED_ROW_COLUMNS predates it).
    await queryRunner.query(`CREATE TABLE reader_settings (date_locale text, theme text, sets jsonb NOT NULL DEFAULT '{}', ${SYNCED_ROW_COLUMNS})`);
    await queryRunner.query('CREATE INDEX reader_settings_user_seq_idx ON reader_settings (user_id, seq) WHERE seq IS NOT NULL');
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP TABLE reader_settings');
  }
}
