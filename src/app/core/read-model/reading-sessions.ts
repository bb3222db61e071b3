import type { PaceSession } from '@shared/reading/pace-session';
import type { LogSession } from '@shared/reading-log/log-session';
import type { Book, Session } from '@shared/sync/schema/collections';

type Format = NonNullable<Book['format']>;

/** A session's format: its own, or else its book's (a session saved without one). */
export function sessionFormat(session: Session, bookFormats: ReadonlyMap<string, Format | undefined>): Format | undefined {
  return session.format ?? (session.bookId ? bookFormats.get(session.bookId) : undefined);
}

/** Live sessions with both times readable, the only ones the log and paces can use. */
export function timedSessions(sessions: readonly Session[]): Session[] {
  return sessions.filter((s) => !s.deleted && Number.isFinite(Date.parse(s.startedAt ?? '')) && Number.isFinite(Date.parse(s.endedAt ?? '')));
}

/**
 * A session as the daily log counts it. Active minutes default to the whole span. Pages are
 * `toPosition − fromPosition` for print only: an ebook's percent and an audiobook's minutes are
 * not pages.
 */
export function toLogSession(session: Session, format: Format | undefined): LogSession {
  const startedAt = session.startedAt!;
  const endedAt = session.endedAt!;
  const span = Math.max(0, (Date.parse(endedAt) - Date.parse(startedAt)) / 60_000);
  const pages =
    format === 'print' && session.fromPosition != null && session.toPosition != null ? Math.max(0, session.toPosition - session.fromPosition) : undefined;
  return { startedAt, endedAt, activeMinutes: session.activeMinutes ?? span, pages };
}

/** The reader's sessions as the daily log counts them. */
export function logSessions(sessions: readonly Session[], books: readonly Book[]): LogSession[] {
  const formats = new Map(books.map((book) => [book.id, book.format]));
  return timedSessions(sessions).map((session) => toLogSession(session, sessionFormat(session, formats)));
}

/** A session as pace calculations use it; null when it lacks a format, minutes or positions. */
export function toPaceSession(session: Session, format: Format | undefined): PaceSession | null {
  const { startedAt, endedAt, activeMinutes, fromPosition, toPosition } = session;
  if (!format || !startedAt || !endedAt || activeMinutes == null || fromPosition == null || toPosition == null) return null;
  return { format, startedAt, endedAt, activeMinutes, fromPosition, toPosition, playbackSpeed: session.playbackSpeed ?? undefined };
}

/** Newest first, by start (by instant: '…:00Z' and '…:00.500Z' do not order as text). */
export function newestFirst(sessions: readonly Session[]): Session[] {
  return [...sessions].sort((a, b) => instant(b.startedAt) - instant(a.startedAt) || b.id.localeCompare(a.id));
}

/** The latest session of a book that says where the reader got to. */
export function latestPosition(sessions: readonly Session[]): Session | undefined {
  return [...sessions].filter((s) => !s.deleted && s.toPosition != null).sort((a, b) => instant(b.endedAt ?? b.startedAt) - instant(a.endedAt ?? a.startedAt))[0];
}

/** Milliseconds of a timestamp; a missing or unreadable one sorts first. */
function instant(timestamp: string | null | undefined): number {
  const ms = Date.parse(timestamp ?? '');
  return Number.isFinite(ms) ? ms : -Infinity;
}
