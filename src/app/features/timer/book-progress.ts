import type { Book, Session } from '@shared/sync/schema/collections';

/** How positions in a book are counted: pages (print), percent (ebook), listened minutes (audiobook). */
export type PositionUnit = 'page' | 'percent' | 'minute';

type BookLength = Pick<Book, 'format' | 'pageCount' | 'audioMinutes'>;

/** The unit of a book's positions, as `sessions` keeps them. */
export function positionUnit(book: Pick<Book, 'format'> | undefined): PositionUnit {
  if (book?.format === 'ebook') return 'percent';
  if (book?.format === 'audiobook') return 'minute';
  return 'page';
}

/** Where the book ends in its unit, when known: its page count, 100 %, or its listening minutes. */
export function positionEnd(book: BookLength | undefined): number | null {
  const unit = positionUnit(book);
  if (unit === 'percent') return 100;
  if (unit === 'minute') return book?.audioMinutes ?? null;
  return book?.pageCount ?? null;
}

/** Minutes as hours and minutes: "3 h 20 min", "45 min". */
export function minutesText(minutes: number): string {
  const whole = Math.round(minutes);
  const hours = Math.floor(whole / 60);
  return hours > 0 ? `${hours} h ${whole % 60} min` : `${whole} min`;
}

/** Where the reader is, in words: "Page 120 of 320", "42 % read", "3 h 20 min of 11 h 5 min". */
export function progressLine(book: BookLength | undefined, position: number | null): string {
  const unit = positionUnit(book);
  const end = positionEnd(book);
  if (position == null) return unit === 'page' && end ? `${end} pages` : 'Not started yet';
  if (unit === 'percent') return `${position} % read`;
  if (unit === 'minute') return end ? `${minutesText(position)} of ${minutesText(end)}` : `${minutesText(position)} listened`;
  return end ? `Page ${position} of ${end}` : `Page ${position}`;
}

/** How far through the book, 0 to 1, or `null` when its length is unknown. */
export function progressFraction(book: BookLength | undefined, position: number | null): number | null {
  const end = positionEnd(book);
  if (!end) return null;
  return Math.min(1, Math.max(0, (position ?? 0) / end));
}

/** The position is the book's end (or past it). */
export function reachedEnd(book: BookLength | undefined, position: number | null): boolean {
  const end = positionEnd(book);
  return end != null && position != null && position >= end;
}

/**
 * The reader's latest session of a book, by when it started (deleted ones and `exceptId` left
 * out), optionally only among sessions that have `field` set.
 */
export function latestSession(
  sessions: readonly Session[],
  bookId: string,
  options: { exceptId?: string; having?: 'toPosition' | 'playbackSpeed' | 'ebookLocation' } = {},
): Session | undefined {
  const { exceptId, having } = options;
  return sessions
    .filter((s) => s.bookId === bookId && !s.deleted && s.id !== exceptId && (!having || s[having] != null))
    .reduce<Session | undefined>((latest, s) => (!latest || (s.startedAt ?? '') > (latest.startedAt ?? '') ? s : latest), undefined);
}

/** Elapsed time as a clock shows it: "25:03", "1:05:09". */
export function elapsedText(ms: number): string {
  const seconds = Math.floor(Math.max(0, ms) / 1000);
  const h = Math.floor(seconds / 3600);
  const mm = String(Math.floor((seconds % 3600) / 60)).padStart(2, '0');
  const ss = String(seconds % 60).padStart(2, '0');
  return h > 0 ? `${h}:${mm}:${ss}` : `${mm}:${ss}`;
}

/** Minutes in words, for a saved session: "25 minutes", "1 minute", "less than a minute". */
export function minutesWords(minutes: number | null | undefined): string {
  // Under a minute is said so, never rounded up to "1 minute": the stop form discards it on Skip.
  if (!((minutes ?? 0) >= 1)) return 'less than a minute';
  const whole = Math.round(minutes!);
  return whole === 1 ? '1 minute' : `${whole} minutes`;
}
