import { inject, Injectable } from '@angular/core';
import { Subject } from 'rxjs';

import { CIRCLE_COLLECTIONS, type CircleCollectionName } from '@shared/circles/circle-collections';
import { HlcClock } from '@shared/sync/hlc';
import { validatePatch } from '@shared/sync/validate-patch';

import { InvalidFieldsError } from '../../../core/data/field-errors';
import type { CircleOutboxEntry } from '../../../core/data/journal-db';
import { LocalJournal } from '../../../core/data/local-journal';
import { deviceId } from '../../../core/device/device-id';
import type { LocalCircleRow } from './circle-rows';

const sameValue = (a: unknown, b: unknown) => JSON.stringify(a ?? null) === JSON.stringify(b ?? null);

/**
 * Writes circle data on this device first, like JournalStore does for the reader's own journal:
 * validated by the shared schema, stamped with the device's clock (the same `meta.clock`, so no
 * clock is issued twice) and queued in `circleOutbox` for CircleSync, all in one transaction.
 */
@Injectable({ providedIn: 'root' })
export class CircleStore {
  private readonly journal = inject(LocalJournal);
  private readonly writes = new Subject<string>();

  /** The circle of each local write (CircleSync sends it soon after). */
  readonly localWrites = this.writes.asObservable();

  async write(collection: CircleCollectionName, rowId: string, circleId: string, patch: Readonly<Record<string, unknown>>): Promise<void> {
    const problems = validatePatch(CIRCLE_COLLECTIONS[collection], patch);
    if (Object.keys(problems).length > 0) throw new InvalidFieldsError(problems);
    const db = this.journal.requireDb();
    const table = db.table<LocalCircleRow, string>(collection);
    const changed = await db.transaction('rw', [table, db.circleOutbox, db.meta], async () => {
      const row: LocalCircleRow = (await table.get(rowId)) ?? { id: rowId, _hlc: {}, _author: db.userId };
      const fields = Object.entries({ circleId, ...patch }).filter(([field, value]) => !sameValue(row[field], value));
      if (fields.length === 0) return false;
      const offset = Number((await db.meta.get('clockOffset'))?.value ?? 0) || 0;
      const hlc = new HlcClock(deviceId(), () => Date.now() + offset, (await db.meta.get('clock'))?.value).tick();
      const next: Record<string, unknown> = { ...row, _hlc: { ...row._hlc } };
      const outbox: CircleOutboxEntry[] = [];
      for (const [field, value] of fields) {
        next[field] = value;
        (next['_hlc'] as Record<string, string>)[field] = hlc;
        outbox.push({ id: crypto.randomUUID(), circleId, collection, rowId, field, value, hlc });
      }
      await table.put(next as LocalCircleRow);
      await db.meta.put({ key: 'clock', value: hlc });
      await db.circleOutbox.bulkAdd(outbox);
      return true;
    });
    if (changed) this.writes.next(circleId);
  }

  /** A new row with a client-made id (works offline); answers the id. */
  async create(collection: CircleCollectionName, circleId: string, fields: Readonly<Record<string, unknown>>): Promise<string> {
    const id = crypto.randomUUID();
    await this.write(collection, id, circleId, { ...fields, deleted: false });
    return id;
  }
}
