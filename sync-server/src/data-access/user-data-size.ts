import type { DataSource } from 'typeorm';

import { COLLECTIONS } from '../../../shared/sync/schema/collections';

/** Tables whose rows belong to one reader (by `user_id`); their size is the reader's stored data. */
export const USER_DATA_TABLES: readonly string[] = Object.values(COLLECTIONS).map((spec) => spec.table);

/**
 * Bytes each user's data takes in PostgreSQL, by user id: `pg_column_size` of whole rows of the
 * synced tables, plus the byte size of every upload they own. An image two readers uploaded is
 * stored once but counts for both, since each would keep it if the other left.
 */
export async function storedBytesByUser(dataSource: DataSource, onlyUserIds?: readonly string[]): Promise<Map<string, number>> {
  // A page of the admin list asks for its own accounts only, so the cost follows the page, not every account.
  const where = onlyUserIds ? 'WHERE user_id = ANY($1::uuid[])' : '';
  const params = onlyUserIds ? [onlyUserIds] : [];
  const sizes = new Map<string, number>();
  const add = (rows: { user_id: string; bytes: string }[]) => {
    for (const row of rows) sizes.set(row.user_id, (sizes.get(row.user_id) ?? 0) + Number(row.bytes));
  };
  for (const table of USER_DATA_TABLES) {
    add(await dataSource.query(`SELECT user_id, sum(pg_column_size(t.*))::bigint AS bytes FROM ${table} t ${where} GROUP BY user_id`, params));
  }
  add(
    await dataSource.query(
      `SELECT o.user_id, sum(u.byte_size)::bigint AS bytes
         FROM upload_owners o JOIN uploads u ON u.id = o.upload_id
        ${where.replace('user_id', 'o.user_id')}
        GROUP BY o.user_id`,
      params,
    ),
  );
  return sizes;
}
