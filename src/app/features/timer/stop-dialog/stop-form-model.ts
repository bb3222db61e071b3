import { sessionProblems } from '@shared/reading/session-problems';
import type { Book, Session, SESSION_MOODS } from '@shared/sync/schema/collections';

import { latestSession, minutesText, positionEnd, positionUnit } from '../book-progress';

type Mood = (typeof SESSION_MOODS)[number];

/** How a session felt, in the reader's words. */
export const MOOD_LABELS: Record<Mood, string> = {
  absorbed: 'Absorbed',
  calm: 'Calm',
  restless: 'Restless',
  sleepy: 'Sleepy',
  moved: 'Moved',
};

/** The stop form: where the reader got to, and how it went. */
export interface StopFormValue {
  readonly toPosition: number | null;
  readonly ebookLocation: string;
  readonly playbackSpeed: number | null;
  readonly mood: Mood | '';
  readonly note: string;
}

/** The session fields the stop form edits. */
export type StopFields = Pick<Session, 'toPosition' | 'ebookLocation' | 'playbackSpeed' | 'mood' | 'note'>;

/**
 * The form as it opens: what the session already says, else what the reader's previous session
 * of the book says (where it ended, the ebook location, the playback speed), else where this
 * session started.
 */
export function stopFormPrefill(session: Session, sessionsOfBook: readonly Session[]): StopFormValue {
  const bookId = session.bookId ?? '';
  const previous = (having: 'toPosition' | 'ebookLocation' | 'playbackSpeed') => latestSession(sessionsOfBook, bookId, { exceptId: session.id, having });
  return {
    toPosition: session.toPosition ?? previous('toPosition')?.toPosition ?? session.fromPosition ?? null,
    ebookLocation: session.ebookLocation ?? previous('ebookLocation')?.ebookLocation ?? '',
    playbackSpeed: session.playbackSpeed ?? previous('playbackSpeed')?.playbackSpeed ?? null,
    mood: session.mood ?? '',
    note: session.note ?? '',
  };
}

/** The form as session fields; an ebook location only for ebooks, a speed only for audiobooks. */
export function stopFields(value: StopFormValue, book: Pick<Book, 'format'> | undefined): StopFields {
  const unit = positionUnit(book);
  return {
    toPosition: value.toPosition,
    ebookLocation: unit === 'percent' ? value.ebookLocation.trim() || null : null,
    playbackSpeed: unit === 'minute' ? value.playbackSpeed : null,
    mood: value.mood || null,
    note: value.note.trim() || null,
  };
}

/** Only the fields that differ from the stored session, so an unchanged field is never rewritten. */
export function changedStopFields(session: Session, fields: StopFields): Partial<StopFields> {
  return Object.fromEntries(Object.entries(fields).filter(([key, value]) => (session[key as keyof StopFields] ?? null) !== value));
}

/** What is wrong, split into the form's own fields and the rest of the session (its times). */
export interface StopProblems {
  readonly fields: Record<string, string>;
  readonly session: string[];
}

const FORM_FIELDS = new Set(['toPosition', 'ebookLocation', 'playbackSpeed', 'mood', 'note']);

/**
 * Checks the form against the book (a position past its end) and the session rules of
 * `sessionProblems` (a session that goes backwards in the book, overlaps another, …).
 */
export function stopProblems(book: Book | undefined, session: Session, fields: StopFields, others: readonly Session[], nowMs: number): StopProblems {
  const problems: Record<string, string> = {};
  const end = positionEnd(book);
  const unit = positionUnit(book);
  if (fields.toPosition != null && fields.toPosition < 0) problems['toPosition'] = 'It cannot be below 0';
  else if (fields.toPosition != null && end != null && fields.toPosition > end) {
    problems['toPosition'] =
      unit === 'percent' ? 'A percent is at most 100' : unit === 'minute' ? `The book is ${minutesText(end)} long` : `The book has ${end} pages`;
  }
  if (fields.playbackSpeed != null && (fields.playbackSpeed < 0.5 || fields.playbackSpeed > 4)) {
    problems['playbackSpeed'] = 'Choose a speed from 0.5 to 4';
  }
  const rules = sessionProblems({ ...session, ...fields }, others, nowMs);
  const rest: string[] = [];
  for (const [field, message] of Object.entries(rules)) {
    if (FORM_FIELDS.has(field)) problems[field] ??= message;
    else rest.push(message);
  }
  return { fields: problems, session: rest };
}
