import type { DataSource } from 'typeorm';

import { COLLECTIONS } from '../../../shared/sync/schema/collections';

/** Tables whose rows belong to one reader (by `user_id`); their size is the reader's stored data. */
export const USER_DATA_TABLES: readonly string[] = Object.keys(COLLECTIONS);

/** Bytes each user's rows take in PostgreSQL (`pg_column_size` of whole rows), by user id. */
export async function storedBytesByUser(dataSource: DataSource): Promise<Map<string, number>> {
  const sizes = new Map<string, number>();
  for (const table of USER_DATA_TABLES) {
    const rows: { user_id: string; bytes: string }[] = await dataSource.query(
      `SELECT user_id, sum(pg_column_size(t.*))::bigint AS bytes FROM ${table} t GROUP BY user_id`,
    );
    for (const row of rows) sizes.set(row.user_id, (sizes.get(row.user_id) ?? 0) + Number(row.bytes));
  }
  return sizes;
}
