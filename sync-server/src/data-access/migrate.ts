import type { DataSource } from 'typeorm';

/** Our key for the session advisory lock that lets one process migrate at a time. */
const MIGRATION_LOCK = 7_264_010;

/**
 * Runs pending migrations while holding a PostgreSQL advisory lock, so instances starting at the
 * same time behind a load balancer take turns: the first migrates, the others then find nothing
 * to do instead of failing on a half-made table.
 */
export async function migrate(dataSource: DataSource): Promise<void> {
  const lockHolder = dataSource.createQueryRunner();
  await lockHolder.connect();
  try {
    await lockHolder.query('SELECT pg_advisory_lock($1)', [MIGRATION_LOCK]);
    await dataSource.runMigrations();
  } finally {
    await lockHolder.query('SELECT pg_advisory_unlock($1)', [MIGRATION_LOCK]).catch(() => undefined);
    await lockHolder.release();
  }
}
