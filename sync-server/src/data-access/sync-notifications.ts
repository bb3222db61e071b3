import type { DataSource } from 'typeorm';

import { COLLECTIONS } from '../../../shared/sync/schema/collections';

/** The PostgreSQL channel that carries "this reader's data changed" between server instances. */
export const SYNC_CHANNEL = 'lamplight_sync';

/**
 * A poke for every instance, as SQL to run just before the push's COMMIT in one round trip:
 * PostgreSQL delivers a NOTIFY only when its transaction commits (and drops it on rollback), so a
 * poke can never arrive before the change it announces is visible to a pull. The payload is the
 * reader and the sequence's last value, which is at least every sequence this transaction (and
 * so the reader, whose pushes take turns) has taken; it becomes the stream's event id. The simple
 * query protocol takes no parameters, so `userId` must be exactly a UUID (from a verified token).
 */
export function notifyPushedSql(userId: string): string {
  if (!/^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/.test(userId)) throw new Error('user id must be a lower-case UUID');
  return `SELECT pg_notify('${SYNC_CHANNEL}', '${userId}:' || (SELECT last_value FROM sync_seq));`;
}

/** A notification's payload read back; `null` for anything that is not ours. */
export function parsePoke(payload: string | undefined): { userId: string; seq: number } | null {
  const match = /^([0-9a-f-]{36}):(\d{1,18})$/.exec(payload ?? '');
  return match ? { userId: match[1]!, seq: Number(match[2]) } : null;
}

const LATEST_SEQ_SQL = `SELECT greatest(${Object.values(COLLECTIONS)
  .map((spec) => `(SELECT max(seq) FROM ${spec.table} WHERE user_id = $1)`)
  .join(', ')}) AS seq`;

/** The greatest sequence of any of the reader's rows (0 when they have none). */
export async function latestSeq(dataSource: DataSource, userId: string): Promise<number> {
  const rows: { seq: string | null }[] = await dataSource.query(LATEST_SEQ_SQL, [userId]);
  return Number(rows[0]?.seq ?? 0);
}
