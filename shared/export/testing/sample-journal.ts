import fc from 'fast-check';

import type { LocalRow } from '../../sync/local-row';
import { BOOK_FORMATS, BOOK_STATUSES, type CollectionName } from '../../sync/schema/collections';

/** Invented books, readings, quotes and sessions for the export and import specs. */

const clock = (wall: number, node = 'dev-a') => `${String(wall).padStart(15, '0')}:00000:${node}`;
const stamp = (fields: Record<string, unknown>, hlc: string) => Object.fromEntries(Object.keys(fields).map((name) => [name, hlc]));

/** A row as a device keeps it, every field written under one clock. */
export function localRow(id: string, fields: Record<string, unknown>, wall = 1_764_633_600_000, node = 'dev-a'): LocalRow {
  return { id, ...fields, _hlc: stamp(fields, clock(wall, node)) };
}

export const BOOK_ID = '0b6c2f8e-3c1a-4d2b-9e7f-1a2b3c4d5e6f';
export const OTHER_BOOK_ID = '1c7d3a9f-4d2b-4e3c-8f80-2b3c4d5e6f70';

/** A small journal: two books (one with commas, quotes and a line break in its fields), a reading, a quote, a session and a deleted label. */
export function sampleJournal(): Map<CollectionName, LocalRow[]> {
  return new Map<CollectionName, LocalRow[]>([
    [
      'books',
      [
        localRow(BOOK_ID, {
          title: 'The Lantern, "Again"',
          authors: ['Ines Marlowe', 'Teodor Vask'],
          format: 'print',
          status: 'finished',
          isbn: '9780306406157',
          rating: 4.5,
          pageCount: 312,
          tags: ['sea', 'winter'],
          genres: [],
          labelIds: [],
          deleted: false,
        }),
        localRow(OTHER_BOOK_ID, {
          title: 'Salt Roads\nand Other Tales',
          authors: ['Mirela Oakes'],
          format: 'audiobook',
          status: 'reading',
          audioMinutes: 540,
          deleted: false,
        }),
      ],
    ],
    [
      'readings',
      [
        localRow('2d8e4b0a-5e3c-4f4d-9091-3c4d5e6f7081', {
          bookId: BOOK_ID,
          startedOn: '2026-01-03',
          finishedOn: '2026-01-20',
          rating: 4.5,
          review: 'Quiet, then "loud"; worth it.',
          deleted: false,
        }),
      ],
    ],
    [
      'quotes',
      [
        localRow('3e9f5c1b-6f4d-4a5e-a1a2-4d5e6f708192', {
          bookId: BOOK_ID,
          text: 'Keep the lamp lit,\r\nkeep the door open.',
          page: 41,
          favourite: true,
          tags: [],
          labelIds: [],
          deleted: false,
        }),
      ],
    ],
    [
      'sessions',
      [
        localRow('4fa06d2c-7a5e-4b6f-b2b3-5e6f708192a3', {
          bookId: OTHER_BOOK_ID,
          format: 'audiobook',
          startedAt: '2026-02-01T20:00:00.000Z',
          endedAt: '2026-02-01T20:45:00.000Z',
          activeMinutes: 45,
          fromPosition: 0,
          toPosition: 45,
          source: 'timer',
          deleted: false,
        }),
      ],
    ],
    [
      'labels',
      [{ id: '5ab17e3d-8b6f-4c70-83c4-6f708192a3b4', name: 'Gone', colour: 'sky', icon: 'star', deleted: true, _hlc: { name: clock(1), deleted: clock(2) } }],
    ],
  ]);
}

const words = fc.stringMatching(/^[A-Za-z ,"'\n]{1,40}$/);

/** Arbitrary books as a device keeps them (ids unique), for property tests. */
export const arbitraryBooks = fc
  .uniqueArray(
    fc.record({
      id: fc.uuid({ version: 4 }),
      title: words,
      authors: fc.array(fc.stringMatching(/^[A-Za-z .'-]{1,30}$/), { maxLength: 3 }),
      format: fc.constantFrom(...BOOK_FORMATS),
      status: fc.constantFrom(...BOOK_STATUSES),
      rating: fc.option(fc.integer({ min: 1, max: 10 }).map((halves) => halves / 2)),
      pageCount: fc.option(fc.integer({ min: 1, max: 2000 })),
      tags: fc.uniqueArray(fc.stringMatching(/^[a-z]{1,12}$/), { maxLength: 4 }),
      deleted: fc.boolean(),
      wall: fc.integer({ min: 1_700_000_000_000, max: 1_764_633_600_000 }),
    }),
    { selector: (book) => book.id, maxLength: 12 },
  )
  .map((books) => books.map(({ id, wall, ...fields }) => localRow(id, fields, wall)));
