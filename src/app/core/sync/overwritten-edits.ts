import type { FieldChange } from '@shared/api/sync';
import { parseHlc } from '@shared/sync/hlc';

import type { JournalDb } from '../data/journal-db';

/** One of this device's edits that lost to a later edit from another device. */
export interface OverwrittenEdit {
  readonly collection: string;
  readonly rowId: string;
  readonly field: string;
  /** What this device had written. */
  readonly mine: unknown;
  /** The device (node id) whose edit won. */
  readonly byDevice: string;
  readonly at: string;
}

/** Shown on the book's page this long. */
export const OVERWRITTEN_SHOWN_MS = 7 * 24 * 60 * 60 * 1000;
const MAX_KEPT = 50;

export async function overwrittenEdits(db: JournalDb): Promise<OverwrittenEdit[]> {
  const raw = (await db.meta.get('overwritten'))?.value;
  const all = raw ? (JSON.parse(raw) as OverwrittenEdit[]) : [];
  return all.filter((edit) => Date.now() - Date.parse(edit.at) < OVERWRITTEN_SHOWN_MS);
}

/** Keeps the server's list of this push's superseded changes, newest first, for a while. */
export async function rememberOverwritten(db: JournalDb, pushed: readonly FieldChange[], overwritten: readonly { id: string; by: string }[]): Promise<void> {
  const byId = new Map(pushed.map((change) => [change.id, change]));
  const at = new Date().toISOString();
  const fresh = overwritten.flatMap(({ id, by }) => {
    const change = byId.get(id);
    return change
      ? [{ collection: change.collection, rowId: change.rowId, field: change.field, mine: change.value, byDevice: parseHlc(by)?.node ?? 'unknown', at }]
      : [];
  });
  const kept = [...fresh, ...(await overwrittenEdits(db))].slice(0, MAX_KEPT);
  await db.meta.put({ key: 'overwritten', value: JSON.stringify(kept) });
}
