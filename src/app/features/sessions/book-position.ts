import type { Book, Session } from '@shared/sync/schema/collections';

import { bookEnd } from '../../core/read-model/book-end';

// Kept here too, where the sessions area has always found it.
export { bookEnd };

type Format = NonNullable<Book['format']>;

/** Words readers see for how a session felt. */
export const MOOD_LABELS: Record<NonNullable<Session['mood']>, string> = {
  absorbed: 'Absorbed',
  calm: 'Calm',
  restless: 'Restless',
  sleepy: 'Sleepy',
  moved: 'Moved',
};

/** Minutes as "45 min" or "2 h 5 min" (whole minutes, rounded). */
export function minutesLine(minutes: number): string {
  const whole = Math.max(0, Math.round(minutes));
  const hours = Math.floor(whole / 60);
  return hours > 0 ? `${hours} h ${whole % 60} min` : `${whole} min`;
}

/** A position in the book's unit: "p. 120", "45 %", "1 h 20 min". */
export function positionLine(position: number, format: Format | null | undefined): string {
  if (format === 'ebook') return `${round(position)} %`;
  if (format === 'audiobook') return minutesLine(position);
  return `p. ${round(position)}`;
}

/** "Page 120 of 300", "45 % of the book", "1 h 20 min of 11 h 5 min". */
export function progressLine(position: number, end: number, format: Format | null | undefined): string {
  if (format === 'ebook') return `${round(position)} % of the book`;
  if (format === 'audiobook') return `${minutesLine(position)} of ${minutesLine(end)}`;
  return `Page ${round(position)} of ${end}`;
}

/** Labels of the position fields in the session editor, by format. */
export function positionLabels(format: Format | null | undefined): { from: string; to: string; hint: string } {
  if (format === 'ebook') return { from: 'From (percent)', to: 'To (percent)', hint: 'How far in the book, 0 to 100' };
  if (format === 'audiobook') {
    return { from: 'From minute', to: 'To minute', hint: 'Listened minutes into the book, e.g. 95 for 1 h 35 min' };
  }
  return { from: 'From page', to: 'To page', hint: '' };
}

/** Whole numbers as they are, others to one decimal. */
function round(value: number): string {
  return Number.isInteger(value) ? String(value) : value.toFixed(1);
}
