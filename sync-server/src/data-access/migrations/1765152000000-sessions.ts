import type { MigrationInterface, QueryRunner } from 'typeorm';

import { SYNCED_ROW_COLUMNS } from './synced-row-columns';

/** Reading sessions and the stored reading timer. */
export class Sessions1765152000000 implements MigrationInterface {
  name = 'Sessions1765152000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE TABLE sessions (book_id uuid, format text, started_at text, ended_at text, active_minutes double precision, from_position double precision, to_position double precision, ebook_location text, playback_speed double precision, mood text, note text, source text, ${SYNCED_ROW_COLUMNS})`,
    );
    await queryRunner.query('CREATE INDEX sessions_user_seq_idx ON sessions (user_id, seq) WHERE seq IS NOT NULL');
    await queryRunner.query(
      `CREATE TABLE timers (state text, book_id uuid, started_at text, paused_at text, paused_ms double precision, device_id text, device_name text, target_minutes integer, start_position double precision, ${SYNCED_ROW_COLUMNS})`,
    );
    await queryRunner.query('CREATE INDEX timers_user_seq_idx ON timers (user_id, seq) WHERE seq IS NOT NULL');
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP TABLE timers');
    await queryRunner.query('DROP TABLE sessions');
  }
}
