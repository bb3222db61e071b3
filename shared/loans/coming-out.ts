import { daysFrom } from './loan-state';

/** A book with a release date (any row with these fields). */
export interface Release {
  readonly id: string;
  readonly releaseDate?: string | null;
  readonly title?: string | null;
}

/**
 * Releases from `today` on, soonest first, split into the next seven days (today included) and
 * later. Past releases are left out.
 *
 * @example
 * comingOut([{ id: 'a', releaseDate: '2026-03-09' }, { id: 'b', releaseDate: '2026-03-20' }], '2026-03-03')
 * // { thisWeek: [a], later: [b] }
 */
export function comingOut<T extends Release>(books: readonly T[], today: string): { thisWeek: T[]; later: T[] } {
  const ahead = books
    .filter((book): book is T & { releaseDate: string } => !!book.releaseDate && daysFrom(today, book.releaseDate) >= 0)
    .sort((a, b) => a.releaseDate.localeCompare(b.releaseDate) || (a.title ?? '').localeCompare(b.title ?? ''));
  return { thisWeek: ahead.filter((book) => daysFrom(today, book.releaseDate) < 7), later: ahead.filter((book) => daysFrom(today, book.releaseDate) >= 7) };
}
