import type { Book, Session } from '@shared/sync/schema/collections';

import type { JournalDb } from '../../core/data/journal-db';

/** The sessions still there and every book, deleted ones too (a forecast reads the whole shelf). */
export interface SessionsAndBooks {
  readonly sessions: Session[];
  readonly books: Book[];
}

export const NO_SESSIONS_OR_BOOKS: SessionsAndBooks = { sessions: [], books: [] };

export async function sessionsAndBooks(db: JournalDb): Promise<SessionsAndBooks> {
  const [sessions, books] = await Promise.all([db.current('sessions'), db.rows('books').toArray()]);
  return { sessions, books };
}
