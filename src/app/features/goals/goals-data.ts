import type { JournalDb } from '../../core/data/journal-db';

/** What a month's account reads besides the goal rows: status changes and quotes, none deleted. */
export const statusChangesAndQuotes = (db: JournalDb) => db.currentOf('bookStatusChanges', 'quotes');

export const NO_STATUS_CHANGES_OR_QUOTES: Awaited<ReturnType<typeof statusChangesAndQuotes>> = { bookStatusChanges: [], quotes: [] };
