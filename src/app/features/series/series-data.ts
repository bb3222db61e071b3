import type { Book, Series } from '@shared/sync/schema/collections';

import { isCurrent, type JournalDb } from '../../core/data/journal-db';

/** Every series the reader keeps, with the books that belong to one (for the list's progress). */
export async function allSeries(db: JournalDb): Promise<{ series: Series[]; books: Book[] }> {
  const [series, books] = await Promise.all([db.current('series'), db.rows('books').where('seriesId').above('').filter(isCurrent).toArray()]);
  return { series, books };
}

/** One series and its books. */
export async function oneSeries(db: JournalDb, id: string): Promise<{ series: Series | undefined; books: Book[] }> {
  const [series, books] = await Promise.all([db.rows('series').get(id), db.rows('books').where('seriesId').equals(id).filter(isCurrent).toArray()]);
  return { series, books };
}
