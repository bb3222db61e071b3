import type { Book, BookStatusChange, Reading, Series } from '@shared/sync/schema/collections';

import { isCurrent, type JournalDb } from '../../core/data/journal-db';

/** The books still on the shelf. */
export const shelfBooks = (db: JournalDb): Promise<Book[]> => db.current('books');

/** The sessions still there (for each book's percent read). */
export const shelfSessions = (db: JournalDb) => db.current('sessions');

/** The series still there, by name (the book form's choice). */
export async function seriesByName(db: JournalDb): Promise<Series[]> {
  return (await db.current('series')).sort((a, b) => (a.name ?? '').localeCompare(b.name ?? ''));
}

/** Everything the reader keeps about one book, on this device, together with what is linked to it. */
export interface BookDossier {
  readonly book: Book | undefined;
  readonly readings: Reading[];
  readonly history: BookStatusChange[];
  readonly series: Series | undefined;
}

/** One book, its readings (latest first), its status history (latest first) and its series unless deleted. */
export async function bookDossier(db: JournalDb, id: string): Promise<BookDossier> {
  const [book, readings, history] = await Promise.all([
    db.rows('books').get(id),
    db.rows('readings').where('bookId').equals(id).filter(isCurrent).toArray(),
    db.rows('bookStatusChanges').where('bookId').equals(id).filter(isCurrent).toArray(),
  ]);
  const series = book?.seriesId ? await db.rows('series').get(book.seriesId) : undefined;
  return {
    book,
    series: series && isCurrent(series) ? series : undefined,
    readings: readings.sort((a, b) => (b.startedOn ?? '').localeCompare(a.startedOn ?? '')),
    history: history.sort((a, b) => (b.changedAt ?? '').localeCompare(a.changedAt ?? '')),
  };
}
