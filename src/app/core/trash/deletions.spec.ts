import { TestBed } from '@angular/core/testing';

import type { LocalRow } from '@shared/sync/local-row';

import { openTestJournal, type TestJournal } from '../testing/test-journal';
import { Deletions } from './deletions';

const BOOK = '00000000-0000-4000-8000-0000000e0001';
const SESSION = (n: number) => `00000000-0000-4000-8000-0000000e010${n}`;
const QUOTE = '00000000-0000-4000-8000-0000000e0201';

/** Deleting and restoring against a real IndexedDB journal: what goes together comes back together. */
describe('Deletions', () => {
  let journal: TestJournal;
  let deletions: Deletions;
  const deleted = async (collection: 'books' | 'sessions' | 'quotes', id: string) => (await journal.store.get(collection, id))?.deleted;
  const clockOf = async (collection: 'books' | 'sessions' | 'quotes', id: string) =>
    ((await journal.db.rows(collection).get(id)) as LocalRow | undefined)?._hlc['deleted'];

  beforeEach(async () => {
    journal = openTestJournal();
    await journal.db.open();
    deletions = TestBed.inject(Deletions);
    await journal.store.write('books', BOOK, { title: 'The Copper Weir', format: 'print', status: 'reading', deleted: false });
    for (const n of [1, 2, 3]) await journal.store.write('sessions', SESSION(n), { bookId: BOOK, activeMinutes: 10 * n, deleted: false });
    await journal.store.write('quotes', QUOTE, { bookId: BOOK, text: 'The weir hums in winter.', deleted: false });
  });

  afterEach(() => journal.close());

  it('counts what would go with a book: its sessions and quotes not deleted yet', async () => {
    await journal.store.remove('sessions', SESSION(3));
    const counts = Object.fromEntries((await deletions.companionsOf('books', BOOK)).map(({ collection, ids }) => [collection, ids.length]));
    expect(counts).toEqual({ readings: 0, sessions: 2, quotes: 1, bookStatusChanges: 0 });
  });

  it('deletes a book with its sessions and quotes under one clock, and restores exactly those', async () => {
    await journal.store.remove('sessions', SESSION(3)); // deleted on its own, earlier
    await deletions.remove('books', BOOK);
    const bookClock = await clockOf('books', BOOK);
    expect(await clockOf('sessions', SESSION(1))).toBe(bookClock);
    expect(await clockOf('quotes', QUOTE)).toBe(bookClock);
    expect(await clockOf('sessions', SESSION(3))).not.toBe(bookClock);

    await deletions.restore('books', BOOK);
    expect(await deleted('books', BOOK)).toBeFalse();
    expect(await deleted('sessions', SESSION(1))).toBeFalse();
    expect(await deleted('sessions', SESSION(2))).toBeFalse();
    expect(await deleted('quotes', QUOTE)).toBeFalse();
    expect(await deleted('sessions', SESSION(3)))
      .withContext('deleted on its own before the book')
      .toBeTrue();
  });

  it('restoring a session alone whose book is in Trash brings the book back with what went with it', async () => {
    await journal.store.remove('sessions', SESSION(3)); // deleted on its own, earlier
    await deletions.remove('books', BOOK);
    const parents = await deletions.restore('sessions', SESSION(3));
    expect(parents.map(({ collection, row }) => `${collection}/${row.id}`)).toEqual([`books/${BOOK}`]);
    expect(await deleted('sessions', SESSION(3))).toBeFalse();
    expect(await deleted('books', BOOK))
      .withContext('a session of a deleted book would show nowhere')
      .toBeFalse();
    expect(await deleted('sessions', SESSION(1))).toBeFalse();
    expect(await deleted('quotes', QUOTE)).toBeFalse();
  });

  it('restoring a session whose book is not deleted brings nothing else', async () => {
    await journal.store.remove('sessions', SESSION(2));
    expect(await deletions.restore('sessions', SESSION(2))).toEqual([]);
    expect(await deleted('sessions', SESSION(2))).toBeFalse();
  });

  it('puts the delete in the outbox as one change per row, all with the same clock', async () => {
    await journal.db.outbox.clear();
    await deletions.remove('books', BOOK);
    const changes = await journal.db.outbox.toArray();
    expect(changes.map((c) => `${c.collection}/${c.field}=${String(c.value)}`).sort()).toEqual([
      'books/deleted=true',
      'quotes/deleted=true',
      'sessions/deleted=true',
      'sessions/deleted=true',
      'sessions/deleted=true',
    ]);
    expect(new Set(changes.map((c) => c.hlc)).size).toBe(1);
  });
});
