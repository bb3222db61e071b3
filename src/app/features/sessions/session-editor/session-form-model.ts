import { instantFromLocalDateTime, localDateTime } from '@shared/calendar/local-date-time';
import type { PatchOf } from '@shared/sync/schema/collection';
import type { Book, Session, sessions } from '@shared/sync/schema/collections';

import { bookEnd } from '../book-position';

/** The session editor's form values, as typed. Times are wall-clock times in the reader's zone. */
export interface SessionFormValue {
  startedAt: string;
  endedAt: string;
  activeMinutes: string;
  fromPosition: string;
  toPosition: string;
  ebookLocation: string;
  playbackSpeed: string;
  mood: NonNullable<Session['mood']> | '';
  note: string;
}

/** The session fields the editor writes. */
export type SessionFields = Required<
  Pick<PatchOf<typeof sessions>, 'startedAt' | 'endedAt' | 'activeMinutes' | 'fromPosition' | 'toPosition' | 'ebookLocation' | 'playbackSpeed' | 'mood' | 'note'>
>;

export const EMPTY_SESSION_FORM: SessionFormValue = {
  startedAt: '',
  endedAt: '',
  activeMinutes: '',
  fromPosition: '',
  toPosition: '',
  ebookLocation: '',
  playbackSpeed: '',
  mood: '',
  note: '',
};

const text = (value: number | null | undefined) => (value == null ? '' : String(value));

/** A stored session as the form shows it, times in the reader's zone. */
export function toSessionForm(session: Session, timeZone: string): SessionFormValue {
  return {
    startedAt: session.startedAt ? localDateTime(session.startedAt, timeZone) : '',
    endedAt: session.endedAt ? localDateTime(session.endedAt, timeZone) : '',
    activeMinutes: text(session.activeMinutes),
    fromPosition: text(session.fromPosition),
    toPosition: text(session.toPosition),
    ebookLocation: session.ebookLocation ?? '',
    playbackSpeed: text(session.playbackSpeed),
    mood: session.mood ?? '',
    note: session.note ?? '',
  };
}

/** Minutes between two wall-clock times in the reader's zone; null unless both are readable. */
export function spanMinutes(startedAt: string, endedAt: string, timeZone: string): number | null {
  const start = instantFromLocalDateTime(startedAt, timeZone);
  const end = instantFromLocalDateTime(endedAt, timeZone);
  return start && end ? (Date.parse(end) - Date.parse(start)) / 60_000 : null;
}

/** What the form's text says, and what of it cannot be read, by field. */
export interface ReadSessionForm {
  readonly fields: SessionFields;
  readonly problems: Record<string, string>;
}

/**
 * Reads the form: times from the reader's zone into UTC, numbers from text, blanks as null.
 * Active minutes left blank are the whole span. Positions past the end of the book, and speeds
 * outside 0.5–4×, are problems; whether the session is possible is `sessionProblems`' part.
 * Ebook location and playback speed apply only to their formats and are null otherwise.
 */
export function readSessionForm(value: SessionFormValue, book: Pick<Book, 'format' | 'pageCount' | 'audioMinutes'>, timeZone: string): ReadSessionForm {
  const problems: Record<string, string> = {};
  const number = (field: keyof SessionFormValue, raw: string): number | null => {
    const trimmed = raw.trim().replace(',', '.');
    if (trimmed === '') return null;
    const parsed = Number(trimmed);
    if (!Number.isFinite(parsed)) {
      problems[field] = 'Use a number';
      return null;
    }
    if (parsed < 0) problems[field] = 'Cannot be negative';
    return parsed;
  };
  const time = (field: 'startedAt' | 'endedAt', raw: string): string | null => {
    if (raw.trim() === '') return null;
    const instant = instantFromLocalDateTime(raw, timeZone);
    if (!instant) problems[field] = 'Use a date and a time';
    return instant;
  };

  const startedAt = time('startedAt', value.startedAt);
  const endedAt = time('endedAt', value.endedAt);
  const span = startedAt && endedAt ? (Date.parse(endedAt) - Date.parse(startedAt)) / 60_000 : null;
  const activeMinutes = number('activeMinutes', value.activeMinutes) ?? (span !== null && span >= 0 ? span : null);
  const fromPosition = number('fromPosition', value.fromPosition);
  const toPosition = number('toPosition', value.toPosition);

  const end = bookEnd(book);
  const unit = book.format === 'ebook' ? 'percent' : book.format === 'audiobook' ? 'minutes' : 'pages';
  for (const [field, position] of [
    ['fromPosition', fromPosition],
    ['toPosition', toPosition],
  ] as const) {
    if (end !== null && position !== null && position > end && !problems[field]) {
      problems[field] = book.format === 'ebook' ? 'Percent goes up to 100' : `The book has ${end} ${unit}`;
    }
  }

  const audio = book.format === 'audiobook';
  const playbackSpeed = audio ? number('playbackSpeed', value.playbackSpeed) : null;
  if (playbackSpeed !== null && (playbackSpeed < 0.5 || playbackSpeed > 4)) problems['playbackSpeed'] = 'Use a speed from 0.5 to 4';

  const blank = (raw: string) => (raw.trim() === '' ? null : raw.trim());
  return {
    fields: {
      startedAt,
      endedAt,
      activeMinutes,
      fromPosition,
      toPosition,
      ebookLocation: book.format === 'ebook' ? blank(value.ebookLocation) : null,
      playbackSpeed,
      mood: value.mood === '' ? null : value.mood,
      note: blank(value.note),
    },
    problems,
  };
}

/**
 * The fields whose text the reader changed, read from the form. Compared as typed rather than as
 * stored, because the form shows times to the minute: a timer's session that started at
 * 20:00:12 is not moved to 20:00:00 by editing its note. Only these are written, so another
 * device's edit of the other fields survives the merge.
 */
export function changedSessionFields(before: SessionFormValue, after: SessionFormValue, fields: SessionFields): Partial<SessionFields> {
  const timesMoved = before.startedAt !== after.startedAt || before.endedAt !== after.endedAt;
  // Blank active minutes are the span, so they change with the times.
  const changed = (field: keyof SessionFields) => before[field] !== after[field] || (field === 'activeMinutes' && after.activeMinutes.trim() === '' && timesMoved);
  return Object.fromEntries((Object.keys(fields) as (keyof SessionFields)[]).filter(changed).map((field) => [field, fields[field]])) as Partial<SessionFields>;
}
