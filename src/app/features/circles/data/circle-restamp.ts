import { CIRCLE_COLLECTIONS } from '@shared/circles/circle-collections';
import { restampClocks, restampFloor } from '@shared/sync/device-clock';

import type { CircleOutboxEntry, JournalDb } from '../../../core/data/journal-db';
import { deviceId } from '../../../core/device/device-id';
import type { LocalCircleRow } from './circle-rows';

const CIRCLE_TABLES = Object.keys(CIRCLE_COLLECTIONS);

/**
 * The circle side of `DexieSyncPorts.restamp`: changes the server refused as `clock_ahead` (a
 * device whose date was wrong) are stamped again from the server-corrected time, with every later
 * change of the circle outbox, in outbox order, after the greatest clock seen from others and every
 * clock the device keeps below the first refused one (`restampFloor`). The rows' clocks and the
 * device clock follow, so nothing is set aside for a clock problem.
 */
export async function restampCircleChanges(db: JournalDb, refused: readonly CircleOutboxEntry[]): Promise<void> {
  if (refused.length === 0) return;
  const tables = CIRCLE_TABLES.map((name) => db.table<LocalCircleRow, string>(name));
  await db.transaction('rw', [db.circleOutbox, db.outbox, db.meta, ...tables], async () => {
    const offset = Number((await db.meta.get('clockOffset'))?.value ?? 0) || 0;
    const from = refused.reduce((min, change) => (change.hlc < min ? change.hlc : min), refused[0]!.hlc);
    const outbox = await db.circleOutbox.orderBy('seq').toArray();
    const ordered = outbox.filter((change) => change.hlc >= from);
    const kept: (string | undefined)[] = [(await db.meta.get('restamped'))?.value, ...outbox.map((change) => change.hlc)];
    await db.outbox.each((change) => kept.push(change.hlc));
    for (const table of tables) await table.each((row) => kept.push(...Object.values(row._hlc)));
    const renamed = restampClocks(
      ordered.map((change) => change.hlc),
      deviceId(),
      () => Date.now() + offset,
      restampFloor(from, (await db.meta.get('seenClock'))?.value, kept),
    );
    const rename = (hlc: string) => renamed.get(hlc) ?? hlc;
    await db.circleOutbox.bulkPut(ordered.map((change) => ({ ...change, hlc: rename(change.hlc) })));
    for (const change of ordered) {
      const table = db.table<LocalCircleRow, string>(change.collection);
      const row = CIRCLE_TABLES.includes(change.collection) ? await table.get(change.rowId) : undefined;
      if (row) await table.put({ ...row, _hlc: Object.fromEntries(Object.entries(row._hlc).map(([field, hlc]) => [field, rename(hlc)])) });
    }
    const last = [...renamed.values()].at(-1)!;
    await db.meta.bulkPut([
      { key: 'clock', value: last },
      { key: 'restamped', value: last },
    ]);
  });
}
