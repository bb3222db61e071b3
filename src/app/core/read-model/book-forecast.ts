import { fallbackPace } from '@shared/reading/fallback-pace';
import { readingGenre } from '@shared/reading/reading-genre';
import { forecastFinish, type Forecast } from '@shared/reading/forecast-finish';
import type { Pace } from '@shared/reading/pace';
import type { PaceSession } from '@shared/reading/pace-session';
import { personalPace } from '@shared/reading/personal-pace';
import { usualMinutesPerDay } from '@shared/reading/usual-minutes-per-day';
import type { Book, Session } from '@shared/sync/schema/collections';

import { bookEnd } from './book-end';
import { latestPosition, logSessions, sessionFormat, timedSessions, toPaceSession } from './reading-sessions';

/** How far the reader is through a book, in its own unit. */
export interface BookProgress {
  /** Where the latest session ended; 0 before any session says. */
  readonly position: number;
  /** Where the book ends; null when its length is not known. */
  readonly end: number | null;
  /** 0–1; null when the length is not known. */
  readonly fraction: number | null;
}

/** What is left of a book and when it should be finished. */
export interface BookForecast extends Forecast {
  /** Whose pace: the reader's own, or typical reading speeds while there is too little history. */
  readonly paceFrom: 'personal' | 'typical';
  readonly pace: Pace;
  /** The reader's usual minutes a day over the last four weeks. */
  readonly minutesPerDay: number;
}

/** Progress from the book's latest session with a position. */
export function bookProgress(book: Book, bookSessions: readonly Session[]): BookProgress {
  const position = latestPosition(bookSessions)?.toPosition ?? 0;
  const end = bookEnd(book);
  return { position, end, fraction: end ? Math.min(1, Math.max(0, position / end)) : null };
}

/**
 * Time left and the forecast finish date of one book: what is left at the reader's pace in its
 * format (`personalPace`, else `fallbackPace`), spread over their usual minutes a day. Null when
 * the book's length is not known.
 *
 * The pace of print and audiobooks comes from all the reader's sessions in that format: pages
 * and listened minutes mean the same in every book. An ebook's pace is percent per hour, which
 * depends on the book's length, so only this book's sessions count.
 */
export function bookForecast(book: Book, allSessions: readonly Session[], books: readonly Book[], today: string, timeZone: string): BookForecast | null {
  const format = book.format ?? 'print';
  const sessions = timedSessions(allSessions);
  const own = sessions.filter((s) => s.bookId === book.id);
  const { position, end } = bookProgress(book, own);
  if (end === null) return null;

  const formats = new Map(books.map((b) => [b.id, b.format]));
  const paceSessions = (format === 'ebook' ? own : sessions).map((s) => toPaceSession(s, sessionFormat(s, formats))).filter((s): s is PaceSession => s !== null);
  const personal = personalPace(paceSessions, format);
  const pace =
    personal ??
    (format === 'ebook'
      ? fallbackPace({ format, pageCount: book.pageCount ?? undefined, genre: readingGenre(book.genres) })
      : format === 'audiobook'
        ? fallbackPace({ format, playbackSpeed: latestPosition(own)?.playbackSpeed ?? undefined })
        : fallbackPace({ format, genre: readingGenre(book.genres) }));
  const minutesPerDay = usualMinutesPerDay(logSessions(sessions, books), today, timeZone);
  const forecast = forecastFinish({ remaining: end - position, pace, minutesPerDay, today, timeZone });
  return { ...forecast, paceFrom: personal ? 'personal' : 'typical', pace, minutesPerDay };
}
