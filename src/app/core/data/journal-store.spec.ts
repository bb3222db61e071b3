import { HttpClient, provideHttpClient } from '@angular/common/http';
import { TestBed } from '@angular/core/testing';
import Dexie from 'dexie';

import { formatHlc, parseHlc } from '@shared/sync/hlc';

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

  it('skips fields whose value did not change, and writes nothing at all for a no-op edit', async () => {
    const id = await store.create('books', { title: 'Small Rain', status: 'reading' });
    const before = await db().outbox.count();

    await store.write('books', id, { title: 'Small Rain', status: 'finished' });
    await store.write('books', id, { status: 'finished' });

    const changes = await db().outbox.toArray();
    expect(changes.length).toBe(before + 1);
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
    expect(new Set(clocks).size).toBe(3); // create wrote title and deleted under one clock
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

  it('writes a set field as a delta, and a pulled state from another device keeps this device\'s unsynced tag', async () => {
    const id = await store.create('books', { title: 'Fern Letters', tags: ['signed'] });
    await store.write('books', id, { tags: ['signed', 'reread'] });
    const [, delta] = (await db().outbox.toArray()).filter((change) => change.field === 'tags');
    expect(Object.keys(delta!.value as object)).toEqual(['reread']); // only what changed
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
});
