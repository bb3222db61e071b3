import type { Book, Session } from '@shared/sync/schema/collections';

import type { JournalDb } from '../../core/data/journal-db';

/** Sessions and books, as Today's panels read them. */
export interface SessionsAndBooks {
  readonly sessions: Session[];
  readonly books: Book[];
}

export const NO_SESSIONS: SessionsAndBooks = { sessions: [], books: [] };

/** The sessions and books still there: what the reader is in the middle of. */
export async function currentSessionsAndBooks(db: JournalDb): Promise<SessionsAndBooks> {
  const [sessions, books] = await Promise.all([db.current('sessions'), db.current('books')]);
  return { sessions, books };
}

/** Every session and book, deleted ones too: the reading log decides what still counts. */
export async function allSessionsAndBooks(db: JournalDb): Promise<SessionsAndBooks> {
  const [sessions, books] = await Promise.all([db.rows('sessions').toArray(), db.rows('books').toArray()]);
  return { sessions, books };
}
