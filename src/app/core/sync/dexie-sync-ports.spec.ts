import { HttpClient } from '@angular/common/http';
import { TestBed } from '@angular/core/testing';

import { formatHlc, parseHlc } from '@shared/sync/hlc';

import { deviceId } from '../device/device-id';
import { openTestJournal, type TestJournal } from '../testing/test-journal';
import { DexieSyncPorts } from './dexie-sync-ports';

const DAY = 24 * 60 * 60 * 1000;

describe('DexieSyncPorts.restamp (a device whose date was wrong)', () => {
  let journal: TestJournal;
  let ports: DexieSyncPorts;

  beforeEach(async () => {
    journal = openTestJournal();
    await journal.db.open();
    ports = new DexieSyncPorts(journal.db, TestBed.inject(HttpClient));
  });
  afterEach(() => journal.close());

  it('re-stamps the refused change and every later one, after the device’s own earlier writes, and the rows follow', async () => {
    const now = Date.now();
    const node = deviceId();
    const own = formatHlc({ wall: now + 60 * 60 * 1000, counter: 0, node }); // kept, below the refused ones
    const ahead = (n: number) => formatHlc({ wall: now + 3 * DAY, counter: n, node });
    const { db } = journal;
    await db.rows('books').bulkPut([
      { id: 'b0', title: 'The Salt Orchard', _hlc: { title: own } },
      { id: 'b1', title: 'Lanterns over Ketterby', format: 'print', _hlc: { title: ahead(0), format: ahead(1) } },
    ] as never);
    await db.outbox.bulkAdd([
      { id: 'c1', collection: 'books', rowId: 'b1', field: 'title', value: 'Lanterns over Ketterby', hlc: ahead(0) },
      { id: 'c2', collection: 'books', rowId: 'b1', field: 'format', value: 'print', hlc: ahead(1) },
    ]);
    await db.meta.put({ key: 'seenClock', value: formatHlc({ wall: now - DAY, counter: 0, node: 'other' }) });

    const [refused] = await db.outbox.orderBy('seq').toArray();
    await ports.restamp([refused!]);

    const outbox = await db.outbox.orderBy('seq').toArray();
    expect(outbox.map((change) => change.id)).toEqual(['c1', 'c2']);
    // Both moved, the later one too, kept their order, and come after the device's own earlier write.
    expect(outbox[0]!.hlc > own).toBeTrue();
    expect(outbox[1]!.hlc > outbox[0]!.hlc).toBeTrue();
    for (const change of outbox) expect(parseHlc(change.hlc)!.wall).toBeLessThan(now + DAY);
    const row = await db.rows('books').get('b1');
    expect(row!._hlc).toEqual({ title: outbox[0]!.hlc, format: outbox[1]!.hlc });
    expect((await db.rows('books').get('b0'))!._hlc).toEqual({ title: own });
    expect((await db.meta.get('clock'))!.value).toBe(outbox[1]!.hlc);
    expect((await db.meta.get('restamped'))!.value).toBe(outbox[1]!.hlc);
  });
});
