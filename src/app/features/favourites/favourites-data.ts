import type { JournalDb } from '../../core/data/journal-db';

/** What the favourites page shows: favourites, month picks, and the books and quotes they name (none deleted). */
export const favouritesAndSubjects = (db: JournalDb) => db.currentOf('favourites', 'monthPicks', 'books', 'quotes');

export type FavouritesAndSubjects = Awaited<ReturnType<typeof favouritesAndSubjects>>;

export const NO_FAVOURITES: FavouritesAndSubjects = { favourites: [], monthPicks: [], books: [], quotes: [] };
