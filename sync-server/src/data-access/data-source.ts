import 'reflect-metadata';
import { DataSource } from 'typeorm';

import { entities } from './entities';
import { migrations } from './migrations';

/**
 * The server's one way to reach PostgreSQL. Schema changes go through migrations only
 * (`synchronize` stays off, so an entity edit without a migration cannot alter a database).
 */
export function createDataSource(databaseUrl: string, options: { poolSize?: number } = {}): DataSource {
  return new DataSource({
    type: 'postgres',
    url: databaseUrl,
    entities,
    migrations,
    synchronize: false,
    migrationsRun: false,
    migrationsTransactionMode: 'each',
    poolSize: options.poolSize ?? 10,
    applicationName: 'lamplight-sync-server',
  });
}
