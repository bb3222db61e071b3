import { HttpClient, provideHttpClient } from '@angular/common/http';
import { TestBed } from '@angular/core/testing';
import Dexie from 'dexie';

import type { PulledChange } from '@shared/api/sync';
import { formatHlc, parseHlc } from '@shared/sync/hlc';
import { orSetElements, type OrSetState } from '@shared/sync/or-set';
import { COLLECTIONS } from '@shared/sync/schema/collections';

import { forgetSession, READER, rememberSession } from '../auth/testing/session-fixtures';
import { DexieSyncPorts } from '../sync/dexie-sync-ports';
import { InvalidFieldsError } from './field-errors';
import { journalDbName } from './journal-db';
import { JournalStore } from './journal-store';
import { LocalJournal } from './local-journal';

/** Real IndexedDB in Chromium, one fresh database per spec. */
describe('JournalStore (IndexedDB through Dexie)', () => {
  let store: JournalStore;
  let journal: LocalJournal;
  let userId: string;

  beforeEach(() => {
    userId = `spec-${crypto.randomUUID()}`;
    rememberSession({ user: { ...READER, id: userId } });
    TestBed.configureTestingModule({ providers: [provideHttpClient()] });
    store = TestBed.inject(JournalStore);
    journal = TestBed.inject(LocalJournal);
  });

  afterEach(async () => {
    TestBed.resetTestingModule(); // closes the reader's database (LocalJournal's cleanup)
    await Dexie.delete(journalDbName(userId));
    forgetSession();
  });

  const db = () => journal.db()!;

  it('writes the row and one outbox change per changed field, all stamped with one new clock', async () => {
    const id = await store.create('books', { title: 'The Glass Orchard', format: 'ebook', status: 'tbr' });

    const row = await db().rows('books').get(id);
    const outbox = await db().outbox.toArray();
    expect(row?.['title']).toBe('The Glass Orchard');
    expect(outbox.map((change) => change.field).sort()).toEqual(['deleted', 'format', 'status', 'title']);
    expect(new Set(outbox.map((change) => change.hlc)).size).toBe(1);
    expect(row?._hlc['title']).toBe(outbox[0]!.hlc);
  });

  it('stores every change of a large write, in the order written (its outbox changes go in slices, in one transaction)', async () => {
    const writes = Array.from({ length: 120 }, (_, n) => ({
      collection: 'books' as const,
      rowId: crypto.randomUUID(),
      patch: { title: `Lantern ${n}`, status: 'tbr' },
    }));

    await store.writeAll(writes);

    const outbox = await db().outbox.toArray();
    expect(outbox.length).toBe(240);
    expect(outbox.filter((change) => change.field === 'title').map((change) => change.value)).toEqual(writes.map((write) => write.patch.title));
    expect(await db().rows('books').count()).toBe(120);
  });

  it('writes rows made here just now as writeAll does, without reading them first', async () => {
    const id = crypto.randomUUID();

    await store.writeNew([{ collection: 'books', rowId: id, patch: { title: 'The Heron Ledger', status: 'tbr', deleted: false } }]);

    expect((await db().rows('books').get(id))?.['title']).toBe('The Heron Ledger');
    expect((await db().outbox.toArray()).map((change) => change.field).sort()).toEqual(['deleted', 'status', 'title']);
  });

  it('skips fields whose value did not change, and writes nothing at all for a no-op edit', async () => {
    const id = await store.create('books', { title: 'Small Rain', status: 'reading' });
    const before = await db().outbox.count();

    await store.write('books', id, { title: 'Small Rain', status: 'finished' });
    await store.write('books', id, { status: 'finished' });

    const changes = await db().outbox.toArray();
    expect(changes.length).toBe(before); // the waiting status change was replaced, not added to
    expect(changes.at(-1)).toEqual(jasmine.objectContaining({ field: 'status', value: 'finished' }));
  });

  it('refuses an invalid edit with a reason per field and changes nothing', async () => {
    const id = await store.create('books', { title: 'Kept as it was', rating: 3 });
    const before = await db().outbox.count();

    await expectAsync(store.write('books', id, { rating: 4.2, title: 'x'.repeat(501) })).toBeRejectedWith(
      new InvalidFieldsError({ rating: 'must be in steps of 0.5', title: 'must be at most 500 characters' }),
    );
    expect((await db().rows('books').get(id))?.['rating']).toBe(3);
    expect(await db().outbox.count()).toBe(before);
  });

  it('keeps clocks increasing across writes, and stores the last one so a reload continues from it', async () => {
    const id = await store.create('books', { title: 'One' });
    await store.write('books', id, { title: 'Two' });
    await store.write('books', id, { title: 'Three' });

    const clocks = (await db().outbox.toArray()).map((change) => change.hlc);
    expect([...clocks].sort()).toEqual(clocks);
    expect(new Set(clocks).size).toBe(2); // create's `deleted`, and the last title (the waiting titles coalesced)
    expect((await db().meta.get('clock'))?.value).toBe(clocks.at(-1)!);
  });

  it('applies pulled values without overwriting a pending local edit that has a later clock', async () => {
    const id = await store.create('books', { title: 'Typed on the plane', status: 'reading' });
    const local = (await db().rows('books').get(id))!._hlc['title']!;
    const older = formatHlc({ wall: parseHlc(local)!.wall - 60_000, counter: 0, node: 'laptop' });
    const newer = formatHlc({ wall: parseHlc(local)!.wall + 60_000, counter: 0, node: 'laptop' });
    const ports = new DexieSyncPorts(db(), TestBed.inject(HttpClient));

    await ports.apply({
      changes: [
        { collection: 'books', rowId: id, field: 'title', value: 'An older title', hlc: older },
        { collection: 'books', rowId: id, field: 'status', value: 'finished', hlc: newer },
      ],
      cursor: 'djE6NQ',
      hasMore: false,
      serverTime: new Date().toISOString(),
    });

    const row = await db().rows('books').get(id);
    expect(row?.['title']).toBe('Typed on the plane');
    expect(row?.['status']).toBe('finished');
    expect((await db().meta.get('cursor'))?.value).toBe('djE6NQ');
    // The receive rule: the device's clock moved past what it saw.
    expect((await db().meta.get('clock'))!.value > newer).toBeTrue();
  });

  it("writes a set field as a delta, and a pulled state from another device keeps this device's unsynced tag", async () => {
    const id = await store.create('books', { title: 'Fern Letters', tags: ['signed'] });
    await store.write('books', id, { tags: ['signed', 'reread'] });
    const [delta] = (await db().outbox.toArray()).filter((change) => change.field === 'tags');
    expect(Object.keys(delta!.value as object).sort()).toEqual(['reread', 'signed']); // two waiting deltas, joined
    const ports = new DexieSyncPorts(db(), TestBed.inject(HttpClient));
    const otherClock = formatHlc({ wall: Date.now() + 1000, counter: 0, node: 'laptop' });

    await ports.apply({
      changes: [
        { collection: 'books', rowId: id, field: 'tags', value: ['book club'], hlc: otherClock, state: { 'book club': { a: { laptop: otherClock }, r: {} } } },
      ],
      cursor: 'x',
      hasMore: false,
      serverTime: new Date().toISOString(),
    });

    expect([...((await db().rows('books').get(id))?.['tags'] as string[])].sort()).toEqual(['book club', 'reread', 'signed']);
  });

  it('coalesces waiting changes to one field of one row: only the newest is sent, with its clock', async () => {
    const id = await store.create('timers', { state: 'running' });
    for (const state of ['paused', 'running', 'paused'] as const) await store.write('timers', id, { state });

    const waiting = (await db().outbox.toArray()).filter((change) => change.field === 'state');
    expect(waiting.length).toBe(1);
    expect(waiting[0]!.value).toBe('paused');
    expect(waiting[0]!.hlc).toBe((await db().rows('timers').get(id))!._hlc['state']!);
  });

  it("coalesces a set field's waiting deltas by joining them, so no add is lost", async () => {
    const id = await store.create('books', { title: 'Loam', tags: ['a'] });
    await store.write('books', id, { tags: ['a', 'b'] });
    await store.write('books', id, { tags: ['b', 'c'] });

    const waiting = (await db().outbox.toArray()).filter((change) => change.field === 'tags');
    expect(waiting.length).toBe(1);
    expect(orSetElements(waiting[0]!.value as OrSetState)).toEqual(['b', 'c']);
  });

  it('holds pulled changes of a collection an older app does not know, and applies them after the update', async () => {
    const http = TestBed.inject(HttpClient);
    const older = new DexieSyncPorts(db(), http, new Set(Object.keys(COLLECTIONS).filter((name) => name !== 'challenges')));
    const hlc = formatHlc({ wall: Date.now(), counter: 0, node: 'laptop' });
    const rowId = crypto.randomUUID();
    const page = (changes: PulledChange[], cursor: string) => ({ changes, cursor, hasMore: false, serverTime: new Date().toISOString() });

    await older.apply(page([{ collection: 'challenges', rowId, field: 'name', value: 'Twelve in the year', hlc }], 'c1'));
    expect(await db().rows('challenges').get(rowId)).toBeUndefined();
    expect(await db().held.count()).toBe(1);
    expect((await db().meta.get('cursor'))?.value).toBe('c1');

    await new DexieSyncPorts(db(), http).apply(page([], 'c2'));
    expect((await db().rows('challenges').get(rowId))?.['name']).toBe('Twelve in the year');
    expect(await db().held.count()).toBe(0);
  });

  it('stamps clock-refused changes again from the corrected time, in order, after what it saw; rows follow', async () => {
    await db().meta.put({ key: 'clockOffset', value: String(-3 * 86_400_000) }); // this device is 3 days ahead
    const seen = formatHlc({ wall: Date.now() - 1000, counter: 7, node: 'laptop' });
    await db().meta.put({ key: 'seenClock', value: seen });
    const id = await store.create('books', { title: 'One' });
    await store.write('books', id, { rating: 4 });
    const ahead = (await db().outbox.toArray()).map((change) => ({
      ...change,
      hlc: formatHlc({ wall: Date.now() + 3 * 86_400_000, counter: change.seq!, node: 'me' }),
    }));
    await db().outbox.bulkPut(ahead);

    await new DexieSyncPorts(db(), TestBed.inject(HttpClient)).restamp(ahead);

    const after = await db().outbox.orderBy('seq').toArray();
    const clocks = after.map((change) => change.hlc);
    expect([...clocks].sort()).toEqual(clocks);
    expect(clocks.every((clock) => clock > seen && parseHlc(clock)!.wall < Date.now() + 60_000)).toBeTrue();
    expect((await db().meta.get('clock'))?.value).toBe(clocks.at(-1)!);
  });

  it('moves the clocks inside a set change with it when it stamps again, so the server takes it (found by the fault schedules)', async () => {
    const id = await store.create('books', { title: 'Two' });
    await db().meta.put({ key: 'clockOffset', value: String(3 * 86_400_000) }); // stamped as if 3 days ahead
    await store.write('books', id, { tags: ['signed'] });
    const [tagChange] = (await db().outbox.toArray()).filter((change) => change.field === 'tags');
    const inner = (state: OrSetState) => Object.values(state).flatMap(({ a, r }) => [...Object.values(a), ...Object.values(r)]);
    expect(inner(tagChange!.value as OrSetState)).toEqual([tagChange!.hlc]);

    await db().meta.put({ key: 'clockOffset', value: '0' }); // the server's time, learnt
    await new DexieSyncPorts(db(), TestBed.inject(HttpClient)).restamp([tagChange!]);

    const [after] = (await db().outbox.toArray()).filter((change) => change.field === 'tags');
    expect(parseHlc(after!.hlc)!.wall).toBeLessThan(Date.now() + 60_000);
    expect(inner(after!.value as OrSetState)).toEqual([after!.hlc]);
    expect(orSetElements(after!.value as OrSetState)).toEqual(['signed']);
    const row = await db().rows('books').get(id);
    expect(inner(row!._sets!['tags']!)).toEqual([after!.hlc]);
  });
});
