import type { ReadingPosition } from './spoiler-shield';

/**
 * How far a reader is in their own copy of a pick: the furthest position their sessions reached,
 * in the book's own unit (pages in print, percent of an ebook, minutes into an audiobook, as the
 * sessions collection keeps them); a finished book is at 100 %. `null` before any reading.
 */
export function readingPositionOf(
  book: { readonly format?: string | null; readonly status?: string | null } | undefined,
  sessions: readonly { readonly toPosition?: number | null; readonly deleted?: boolean | null }[],
): ReadingPosition {
  if (!book) return null;
  if (book.status === 'finished') return { unit: 'percent', value: 100 };
  const furthest = Math.max(-1, ...sessions.filter((session) => !session.deleted && typeof session.toPosition === 'number').map((session) => session.toPosition!));
  if (furthest < 0) return null;
  const unit = book.format === 'ebook' ? 'percent' : book.format === 'audiobook' ? 'minute' : 'page';
  return { unit, value: furthest };
}
