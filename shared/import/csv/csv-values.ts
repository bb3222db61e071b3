import { isValid, parse } from 'date-fns';

import { compactIsbn } from '../../isbn/compact-isbn';
import { isValidIsbn10 } from '../../isbn/is-valid-isbn10';
import { isValidIsbn13 } from '../../isbn/is-valid-isbn13';
import { isbn10To13 } from '../../isbn/isbn10-to-13';
import { BOOK_FORMATS, BOOK_STATUSES } from '../../sync/schema/collections';

export type BookStatus = (typeof BOOK_STATUSES)[number];
export type BookFormat = (typeof BOOK_FORMATS)[number];

/** Date layouts a spreadsheet may use, as date-fns patterns. */
export const CSV_DATE_FORMATS = ['yyyy-MM-dd', 'dd/MM/yyyy', 'MM/dd/yyyy', 'yyyy/MM/dd', 'dd.MM.yyyy'] as const;
export type CsvDateFormat = (typeof CSV_DATE_FORMATS)[number];

/** A value read from a cell, or why it cannot be. */
export type Read<T> = { readonly value: T } | { readonly problem: string };

/** Everyday words for each status; the reader can map any other value themselves. */
const STATUS_WORDS: Readonly<Record<BookStatus, readonly string[]>> = {
  tbr: ['tbr', 'to read', 'to-read', 'want to read', 'planned', 'not started', 'unread', 'queue'],
  reading: ['reading', 'currently reading', 'in progress', 'current', 'started'],
  paused: ['paused', 'on hold', 'on-hold', 'later'],
  finished: ['finished', 'read', 'done', 'completed', 'complete'],
  dnf: ['dnf', 'did not finish', 'abandoned', 'gave up', 'stopped'],
};

/** The status an everyday word suggests ("Currently reading" → reading), or null. */
export function guessStatus(value: string): BookStatus | null {
  const word = value.trim().toLowerCase();
  return (Object.keys(STATUS_WORDS) as BookStatus[]).find((status) => STATUS_WORDS[status].includes(word)) ?? null;
}

/** Every different non-empty value of a column with its guessed status: the value mapping to offer. */
export function statusValueMapping(values: readonly string[]): Map<string, BookStatus | null> {
  const mapping = new Map<string, BookStatus | null>();
  for (const value of values) {
    const key = value.trim();
    if (key && !mapping.has(key)) mapping.set(key, guessStatus(key));
  }
  return mapping;
}

/** A status cell through the reader's value mapping; empty is "to be read". */
export function readStatus(cell: string, mapping: ReadonlyMap<string, BookStatus | null>): Read<BookStatus> {
  const key = cell.trim();
  if (!key) return { value: 'tbr' };
  const status = mapping.get(key) ?? guessStatus(key);
  return status ? { value: status } : { problem: `status "${key}" is not one we know (map it to a status)` };
}

/** A date cell in the chosen layout as 'YYYY-MM-DD'; empty is no date. */
export function readDate(cell: string, layout: CsvDateFormat): Read<string | null> {
  const text = cell.trim();
  if (!text) return { value: null };
  const date = parse(text, layout, new Date(2000, 0, 1));
  if (!isValid(date) || date.getFullYear() < 1000) return { problem: `date "${text}" is not a ${layout.toUpperCase()} date` };
  const pad = (n: number, width = 2) => String(n).padStart(width, '0');
  return { value: `${pad(date.getFullYear(), 4)}-${pad(date.getMonth() + 1)}-${pad(date.getDate())}` };
}

/**
 * A rating from 0.5 to 5 (half stars: other values are rounded to the nearest half); empty or 0
 * is no rating, anything else out of range is refused.
 */
export function readRating(cell: string): Read<number | null> {
  const text = cell.trim().replace(',', '.');
  if (!text || Number(text) === 0) return { value: null };
  const number = Number(text);
  if (!Number.isFinite(number) || number < 0.5 || number > 5) return { problem: `rating "${cell.trim()}" is not between 0.5 and 5` };
  return { value: Math.round(number * 2) / 2 };
}

/**
 * An ISBN cell as ISBN-13 digits: an ISBN-10 is converted (ISO 2108: prefix 978, new check
 * digit), a wrong check digit is refused. Spreadsheet wrappings such as ="…" are taken off.
 */
export function readIsbn(cell: string): Read<string | null> {
  const text = cell.trim().replace(/^="?|"$/g, '');
  if (!text) return { value: null };
  const compact = compactIsbn(text);
  if (compact.length === 13 && /^\d{13}$/.test(compact)) return isValidIsbn13(compact) ? { value: compact } : { problem: `ISBN "${text}" has a wrong check digit` };
  if (compact.length === 10) return isValidIsbn10(compact) ? { value: isbn10To13(compact)! } : { problem: `ISBN "${text}" has a wrong check digit` };
  return { problem: `ISBN "${text}" is not 10 or 13 digits` };
}

/** A format from everyday words; anything else is print. */
export function readFormat(cell: string): BookFormat {
  const word = cell.trim().toLowerCase();
  if (/audio|listen/.test(word)) return 'audiobook';
  if (/e-?book|digital|electronic|epub|pdf/.test(word)) return 'ebook';
  return 'print';
}

/** A list cell split on semicolons or commas (authors on semicolons and ampersands only, as a name may hold a comma). */
export function readList(cell: string, separators: RegExp = /[;,]/): string[] {
  return [
    ...new Set(
      cell
        .split(separators)
        .map((part) => part.trim())
        .filter(Boolean),
    ),
  ];
}

/** A whole number in a range; empty is none. */
export function readWholeNumber(cell: string, name: string, min: number, max: number): Read<number | null> {
  const text = cell.trim();
  if (!text) return { value: null };
  const number = Number(text);
  if (!Number.isInteger(number) || number < min || number > max) return { problem: `${name} "${text}" is not a whole number from ${min} to ${max}` };
  return { value: number };
}
