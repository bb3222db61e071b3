import { deterministicId } from '@shared/sync/deterministic-id';
import type { Book, Session, Timer } from '@shared/sync/schema/collections';

import { isCurrent, type JournalDb } from '../../core/data/journal-db';

/** The one timer row of a reader: one per reader, the same on every device. */
export const TIMER_ROW_ID = deterministicId('reading-timer', 'current');

/** The timer row and the book it is for; `loaded` once the first read has come back. */
export interface TimerAndBook {
  readonly loaded: boolean;
  readonly timer: Timer | undefined;
  readonly book: Book | undefined;
}

export const NO_TIMER: TimerAndBook = { loaded: false, timer: undefined, book: undefined };

export async function timerAndBook(db: JournalDb): Promise<TimerAndBook> {
  const timer = await db.rows('timers').get(TIMER_ROW_ID);
  const book = timer?.bookId ? await db.rows('books').get(timer.bookId) : undefined;
  return { loaded: true, timer, book };
}

/** The timer's book's sessions, and the latest session of all for the page shown with no timer. */
export interface TimerPageData {
  readonly bookSessions: Session[];
  readonly last: Session | undefined;
  readonly lastBook: Book | undefined;
}

export const NO_TIMER_PAGE_DATA: TimerPageData = { bookSessions: [], last: undefined, lastBook: undefined };

export async function timerPageData(db: JournalDb): Promise<TimerPageData> {
  const timer = await db.rows('timers').get(TIMER_ROW_ID);
  const bookSessions = timer?.bookId ? await db.rows('sessions').where('bookId').equals(timer.bookId).toArray() : [];
  const last = await db.rows('sessions').orderBy('startedAt').reverse().filter(isCurrent).first();
  const lastBook = last?.bookId ? await db.rows('books').get(last.bookId) : undefined;
  return { bookSessions, last, lastBook };
}
