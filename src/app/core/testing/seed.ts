import type { Session } from '@shared/sync/schema/collections';

import type { JournalStore } from '../data/journal-store';

/**
 * A small invented library for goal and challenge specs. Local days are for a reader in
 * Los Angeles (IANA tz database: UTC−8 in winter, UTC−7 from 8 March 2026).
 *
 * - jan: "Salt and Lanterns", finished 10 January 2026 (status change at 12:00 PST).
 * - orchard: "The Quiet Orchard" by Ada Okafor, finished 28 February 2026 (status change at
 *   06:30Z on 1 March, 22:30 PST on the 28th).
 * - harrow: "Harrow Light", finished 20 June 2026 by its reading.
 * - eve: "Evening Tide", finished 31 December 2025 in Los Angeles (07:30Z on 1 January 2026 is
 *   23:30 PST), but 1 January 2026 in Tokyo (16:30 JST).
 * - ferry: "The Blue Ferry" by Kit Ashdown, TBR. owl: "An Owl at Dusk", being read.
 */
export async function seedLibrary(store: JournalStore): Promise<void> {
  const book = (id: string, fields: Record<string, unknown>) => store.write('books', id, { format: 'print', authors: ['Ada Okafor'], deleted: false, ...fields });
  await book(BOOK.jan, { title: 'Salt and Lanterns', status: 'finished', statusChangedAt: '2026-01-10T20:00:00.000Z' });
  await book(BOOK.orchard, { title: 'The Quiet Orchard', status: 'finished', statusChangedAt: '2026-03-01T06:30:00.000Z' });
  await book(BOOK.harrow, { title: 'Harrow Light', authors: ['Lio Penhallow'], status: 'finished', statusChangedAt: '2026-06-25T18:00:00.000Z' });
  await store.write('readings', '00000000-0000-4000-8000-0000000000a1', { bookId: BOOK.harrow, startedOn: '2026-06-01', finishedOn: '2026-06-20', deleted: false });
  await book(BOOK.eve, { title: 'Evening Tide', status: 'finished', statusChangedAt: '2026-01-01T07:30:00.000Z' });
  await book(BOOK.ferry, { title: 'The Blue Ferry', authors: ['Kit Ashdown'], status: 'tbr' });
  await book(BOOK.owl, { title: 'An Owl at Dusk', authors: ['Noor Halvorsen'], status: 'reading' });
}

/** The seeded books' ids (UUIDs, as the schema's references must be). */
export const BOOK = {
  jan: '00000000-0000-4000-8000-000000000001',
  orchard: '00000000-0000-4000-8000-000000000002',
  harrow: '00000000-0000-4000-8000-000000000003',
  eve: '00000000-0000-4000-8000-000000000004',
  ferry: '00000000-0000-4000-8000-000000000005',
  owl: '00000000-0000-4000-8000-000000000006',
} as const;

/** A print session of `minutes` from `startedAt` (an instant), reading from position `from` to `to`; returns its id. */
export function addSession(
  store: JournalStore,
  bookId: string,
  startedAt: string,
  minutes: number,
  from: number,
  to: number,
  extra: Partial<Session> = {},
): Promise<string> {
  return store.create('sessions', {
    bookId,
    format: 'print',
    startedAt,
    endedAt: new Date(Date.parse(startedAt) + minutes * 60_000).toISOString(),
    activeMinutes: minutes,
    fromPosition: from,
    toPosition: to,
    ...extra,
  });
}
