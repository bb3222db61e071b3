import { MigrationExecutor, type DataSource } from 'typeorm';

/** Our key for the advisory lock that lets one process migrate at a time. */
const MIGRATION_LOCK = 7_264_010;

/**
 * Runs pending migrations in one transaction that first takes a transaction-level advisory lock,
 * so instances starting at the same time behind a load balancer take turns: the first migrates,
 * the others wait, then find nothing to do instead of failing on a half-made table. The lock
 * ends with the transaction, so it also holds through PgBouncer in transaction mode, where a
 * session-level lock could outlive us on a pooled connection. (PostgreSQL runs DDL inside
 * transactions; a migration must not need to run outside one.)
 */
export async function migrate(dataSource: DataSource): Promise<void> {
  const runner = dataSource.createQueryRunner();
  await runner.connect();
  try {
    await runner.startTransaction();
    await runner.query('SELECT pg_advisory_xact_lock($1)', [MIGRATION_LOCK]);
    const executor = new MigrationExecutor(dataSource, runner);
    executor.transaction = 'none'; // already inside ours
    await executor.executePendingMigrations();
    await runner.commitTransaction();
  } catch (error) {
    if (runner.isTransactionActive) await runner.rollbackTransaction().catch(() => undefined);
    throw error;
  } finally {
    await runner.release();
  }
}
