import type { DataSource } from 'typeorm';

import { createDataSource } from '../../sync-server/src/data-access/data-source';
import { migrate } from '../../sync-server/src/data-access/migrate';

/**
 * The specs' real PostgreSQL database (scripts/test.mjs creates it fresh for every run and sets
 * DATABASE_URL). One migrated DataSource per spec process.
 */
let shared: Promise<DataSource> | undefined;

export function testDatabaseUrl(): string {
  const url = process.env['DATABASE_URL'];
  if (!url) throw new Error('DATABASE_URL is not set: run the specs through `npm test`');
  return url;
}

export function testDataSource(): Promise<DataSource> {
  shared ??= (async () => {
    const dataSource = createDataSource(testDatabaseUrl());
    await dataSource.initialize();
    await migrate(dataSource);
    return dataSource;
  })();
  return shared;
}

/** Closes the shared DataSource after all specs, so Jasmine can exit (not loaded under Jasmine by benchmarks). */
if (typeof afterAll === 'function')
  afterAll(async () => {
    if (shared) await (await shared).destroy();
    shared = undefined;
  });
