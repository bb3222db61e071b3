import type { Book } from '../sync/schema/collections';
import { nextUnread, seriesBooks, seriesProgress } from './series-order';

// An invented series: "The Saltmarsh Quartet" by an invented author, with a novella at 2.5.
const book = (id: string, fields: Partial<Book>): Book => ({ id, seriesId: 's1', deleted: false, ...fields });
const library: Book[] = [
  book('three', { title: 'Tidewrack', seriesPosition: 3, status: 'tbr' }),
  book('one', { title: 'The Reed Gate', seriesPosition: 1, status: 'finished' }),
  book('novella', { title: 'A Winter at the Sluice', seriesPosition: 2.5, status: 'tbr' }),
  book('two', { title: 'Heron Lantern', seriesPosition: 2, status: 'reading' }),
  book('extra', { title: 'Stories from the Marsh', status: 'tbr' }), // no position yet
  book('gone', { title: 'Deleted copy', seriesPosition: 4, deleted: true }),
  book('other', { title: 'Another series', seriesPosition: 1, seriesId: 's2' }),
];

describe('series order', () => {
  it('orders by position, decimals between, unplaced books last; skips deleted and other series', () => {
    expect(seriesBooks(library, 's1').map((b) => b.id)).toEqual(['one', 'two', 'novella', 'three', 'extra']);
  });

  it('counts progress against the planned number when it is larger than what is tracked', () => {
    const ordered = seriesBooks(library, 's1');
    expect(seriesProgress(ordered, 8)).toEqual({ finished: 1, total: 8, fraction: 1 / 8 });
    expect(seriesProgress(ordered, 2)).toEqual({ finished: 1, total: 5, fraction: 1 / 5 });
    expect(seriesProgress([], null)).toEqual({ finished: 0, total: 0, fraction: 0 });
  });

  it('suggests the next one still to read after the one just finished, else the first still to read', () => {
    const ordered = seriesBooks(library, 's1');
    expect(nextUnread(ordered)?.id).toBe('novella'); // book 2 is being read, so it is not "next"
    expect(nextUnread(ordered, 'novella')?.id).toBe('three');
    expect(nextUnread(ordered, 'extra')?.id).toBe('novella'); // nothing after the last: wrap to earlier
    expect(nextUnread(ordered.map((b) => ({ ...b, status: 'finished' as const })))).toBeNull();
  });
});
