import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Each device session remembers the browser's own id, so signing in again reuses the entry. */
export class DeviceIds1765411202000 implements MigrationInterface {
  name = 'DeviceIds1765411202000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('ALTER TABLE device_sessions ADD COLUMN device_id text');
    await queryRunner.query('CREATE INDEX device_sessions_device_idx ON device_sessions (user_id, device_id) WHERE revoked_at IS NULL');
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP INDEX device_sessions_device_idx');
    await queryRunner.query('ALTER TABLE device_sessions DROP COLUMN device_id');
  }
}
