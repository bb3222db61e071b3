import type { Book, Library, Loan } from '@shared/sync/schema/collections';

import { liveQuerySignal } from '../../core/data/live-query';

/** What {@link loansData} gives until the store has answered. */
export const NO_LOANS = { loans: [] as Loan[], libraries: [] as Library[], books: [] as Book[] };

/** Loans, libraries and books from this device's store, kept current (call in an injection context). */
export function loansData() {
  return liveQuerySignal(
    async (db) => ({
      loans: ((await db.rows('loans').toArray()) as Loan[]).filter((l) => !l.deleted),
      libraries: ((await db.rows('libraries').toArray()) as Library[]).filter((l) => !l.deleted),
      books: ((await db.rows('books').toArray()) as Book[]).filter((b) => !b.deleted),
    }),
    NO_LOANS,
  );
}
