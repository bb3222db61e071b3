import { validatePatch } from '../../sync/validate-patch';
import { books, readings } from '../../sync/schema/collections';
import type { CsvTarget } from './csv-fields';
import { readDate, readFormat, readIsbn, readList, readRating, readStatus, readWholeNumber, type BookStatus, type CsvDateFormat, type Read } from './csv-values';

/** The reader's choices for turning rows into books. */
export interface CsvImportOptions {
  /** The field each column fills (null: left out), by column. */
  readonly mapping: readonly (CsvTarget | null)[];
  readonly dateFormat: CsvDateFormat;
  /** Status values as the spreadsheet writes them → ours (null: refuse rows with it). */
  readonly statuses: ReadonlyMap<string, BookStatus | null>;
  /** Import a book whose ISBN is wrong without its ISBN, instead of refusing it. */
  readonly keepBooksWithBadIsbn: boolean;
}

/** One spreadsheet row as a book (and a reading when it has dates, a rating or a review), or why not. */
export type CsvRowPlan =
  | { readonly book: Record<string, unknown>; readonly reading: Record<string, unknown> | null; readonly notes: readonly string[] }
  | { readonly reasons: readonly string[] };

/**
 * Reads one row through the reader's mapping. Every problem of the row is listed (a bad ISBN
 * check digit, a rating out of range, an unknown status, a date not in the chosen layout…), so
 * the dry run shows them all at once.
 */
export function planCsvRow(cells: readonly string[], options: CsvImportOptions): CsvRowPlan {
  const cell = (target: CsvTarget) =>
    options.mapping
      .map((mapped, index) => (mapped === target ? (cells[index] ?? '') : ''))
      .filter(Boolean)
      .join('; ');
  const reasons: string[] = [];
  const notes: string[] = [];
  const take = <T>(read: Read<T>, fallback: T): T => {
    if ('problem' in read) {
      reasons.push(read.problem);
      return fallback;
    }
    return read.value;
  };
  const title = cell('title').trim();
  if (!title) reasons.push('has no title');
  let isbn: string | null = null;
  const readIsbnCell = readIsbn(cell('isbn'));
  if ('problem' in readIsbnCell && options.keepBooksWithBadIsbn) notes.push(`${readIsbnCell.problem}: imported without it`);
  else isbn = take(readIsbnCell, null);
  const format = readFormat(cell('format'));
  const status = take(readStatus(cell('status'), options.statuses), 'tbr');
  const rating = take(readRating(cell('rating')), null);
  const startedOn = take(readDate(cell('startedOn'), options.dateFormat), null);
  const finishedOn = take(readDate(cell('finishedOn'), options.dateFormat), null);
  const pages = take(readWholeNumber(cell('pages'), 'pages', 1, 100_000), null);
  const year = take(readWholeNumber(cell('year'), 'year', 1, 3000), null);
  const review = cell('review').trim() || null;
  const book: Record<string, unknown> = {
    title,
    authors: readList(cell('authors'), /;|&/),
    format,
    status,
    isbn,
    rating,
    pageCount: format === 'audiobook' ? null : pages,
    publisher: cell('publisher').trim() || null,
    year,
    tags: readList([cell('tags'), cell('shelves')].join(';')),
    deleted: false,
  };
  const reading = startedOn || finishedOn || review || (rating !== null && status === 'finished') ? { startedOn, finishedOn, rating, review, deleted: false } : null;
  if (reasons.length === 0) {
    const problems = { ...validatePatch(books, book), ...(reading ? validatePatch(readings, reading) : {}) };
    for (const [field, problem] of Object.entries(problems)) reasons.push(`${field} ${problem}`);
  }
  return reasons.length > 0 ? { reasons } : { book, reading, notes };
}
