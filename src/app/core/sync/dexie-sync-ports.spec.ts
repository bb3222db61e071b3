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

describe('DexieSyncPorts.apply (a large page, as in a first sync)', () => {
  let journal: TestJournal;

  beforeEach(async () => {
    journal = openTestJournal();
    await journal.db.open();
  });
  afterEach(() => journal.close());

  it('stores the new rows of a page of 300 books and merges the few already stored by the per-field rule', async () => {
    const { db, store } = journal;
    // Two books this device has: one with a title typed later than the pulled one, one with an older title.
    const mine = await store.create('books', { title: 'Typed on the ferry', status: 'reading' });
    const theirs = await store.create('books', { title: 'A first draft' });
    const local = (await db.rows('books').get(mine))!._hlc['title']!;
    const at = (offsetMs: number, counter: number) => formatHlc({ wall: parseHlc(local)!.wall + offsetMs, counter, node: 'laptop' });
    const fresh = Array.from({ length: 298 }, (_, n) => ({ rowId: crypto.randomUUID(), title: `The Fen Ledger ${n}` }));
    const changes = [
      { collection: 'books', rowId: mine, field: 'title', value: 'An older title', hlc: at(-60_000, 0) },
      { collection: 'books', rowId: mine, field: 'status', value: 'finished', hlc: at(60_000, 0) },
      { collection: 'books', rowId: theirs, field: 'title', value: 'The final title', hlc: at(60_000, 1) },
      ...fresh.map(({ rowId, title }, n) => ({ collection: 'books', rowId, field: 'title', value: title, hlc: at(60_000, n + 2) })),
    ];

    await new DexieSyncPorts(db, TestBed.inject(HttpClient)).apply({ changes, cursor: 'djE6MzAw', hasMore: false, serverTime: new Date().toISOString() });

    // LWW per field (the same rule the server applies, shared/sync/merge.ts): the later clock wins.
    expect(await db.rows('books').get(mine)).toEqual(jasmine.objectContaining({ title: 'Typed on the ferry', status: 'finished' }));
    expect((await db.rows('books').get(theirs))?.['title']).toBe('The final title');
    const stored = await db.rows('books').bulkGet(fresh.map(({ rowId }) => rowId));
    expect(stored.map((row) => row?.['title'])).toEqual(fresh.map(({ title }) => title));
    expect(stored[0]!._hlc).toEqual({ title: at(60_000, 2) });
    expect(await db.rows('books').count()).toBe(300);
    expect((await db.meta.get('cursor'))?.value).toBe('djE6MzAw');
  });
});
