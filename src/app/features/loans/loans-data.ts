import type { Book, Library, Loan } from '@shared/sync/schema/collections';

import { liveQuerySignal } from '../../core/data/live-query';

/** What {@link loansData} gives until the store has answered. */
export const NO_LOANS = { loans: [] as Loan[], libraries: [] as Library[], books: [] as Book[] };

/** Loans, libraries and books from this device's store, kept current (call in an injection context). */
export function loansData() {
  return liveQuerySignal(async (db) => {
    // Together, not one after another: Today waits for this answer before it shows its panels.
    const [loans, libraries, books] = await Promise.all([db.rows('loans').toArray(), db.rows('libraries').toArray(), db.rows('books').toArray()]);
    return {
      loans: (loans as Loan[]).filter((l) => !l.deleted),
      libraries: (libraries as Library[]).filter((l) => !l.deleted),
      books: (books as Book[]).filter((b) => !b.deleted),
    };
  }, NO_LOANS);
}
