import Papa from 'papaparse';

import type { Book, Quote, Reading, Session } from '../sync/schema/collections';

/** The collections offered as CSV, one file each. */
export const CSV_COLLECTIONS = ['books', 'readings', 'sessions', 'quotes'] as const;
export type CsvCollection = (typeof CSV_COLLECTIONS)[number];

/** Lists (authors, tags, genres) in one cell, joined by this. */
export const CSV_LIST_SEPARATOR = '; ';

/** Byte order mark: spreadsheets read the file as UTF-8 only with it. */
export const UTF8_BOM = '\uFEFF';

type Cell = string | number | boolean | null | undefined;
type Column<Row> = readonly [header: string, value: (row: Row, titleOf: (bookId: unknown) => string) => Cell];

const list = (value: unknown): string => (Array.isArray(value) ? value.join(CSV_LIST_SEPARATOR) : '');

/** The first columns of a row about a book: its own id, the book's id and the book's title. */
const aboutABook = <Row extends { readonly id: string; readonly bookId?: string | null }>(): readonly Column<Row>[] => [
  ['id', (row) => row.id],
  ['book_id', (row) => row.bookId],
  ['book_title', (row, titleOf) => titleOf(row.bookId)],
];

/** Our own column names, documented in src/app/features/your-data/README.md. */
const BOOK_COLUMNS: readonly Column<Book>[] = [
  ['id', (b) => b.id],
  ['title', (b) => b.title],
  ['subtitle', (b) => b.subtitle],
  ['authors', (b) => list(b.authors)],
  ['isbn13', (b) => b.isbn],
  ['format', (b) => b.format],
  ['status', (b) => b.status],
  ['rating', (b) => b.rating],
  ['pages', (b) => b.pageCount],
  ['audio_minutes', (b) => b.audioMinutes],
  ['publisher', (b) => b.publisher],
  ['year', (b) => b.year],
  ['language', (b) => b.language],
  ['genres', (b) => list(b.genres)],
  ['tags', (b) => list(b.tags)],
  ['copy', (b) => b.copy],
  ['series_id', (b) => b.seriesId],
  ['series_position', (b) => b.seriesPosition],
  ['status_changed_at', (b) => b.statusChangedAt],
];

const READING_COLUMNS: readonly Column<Reading>[] = [
  ...aboutABook<Reading>(),
  ['started_on', (r) => r.startedOn],
  ['finished_on', (r) => r.finishedOn],
  ['rating', (r) => r.rating],
  ['summary', (r) => r.summary],
  ['review', (r) => r.review],
  ['takeaways', (r) => r.takeaways],
  ['recommend', (r) => r.recommend],
];

const SESSION_COLUMNS: readonly Column<Session>[] = [
  ...aboutABook<Session>(),
  ['started_at', (s) => s.startedAt],
  ['ended_at', (s) => s.endedAt],
  ['active_minutes', (s) => s.activeMinutes],
  ['format', (s) => s.format],
  ['from_position', (s) => s.fromPosition],
  ['to_position', (s) => s.toPosition],
  ['mood', (s) => s.mood],
  ['note', (s) => s.note],
  ['source', (s) => s.source],
];

const QUOTE_COLUMNS: readonly Column<Quote>[] = [
  ...aboutABook<Quote>(),
  ['text', (q) => q.text],
  ['page', (q) => q.page],
  ['chapter', (q) => q.chapter],
  ['ebook_location', (q) => q.ebookLocation],
  ['audio_seconds', (q) => q.audioSeconds],
  ['note', (q) => q.note],
  ['tags', (q) => list(q.tags)],
  ['favourite', (q) => q.favourite],
  ['captured_at', (q) => q.capturedAt],
];

const COLUMNS: { readonly [C in CsvCollection]: readonly Column<never>[] } = {
  books: BOOK_COLUMNS,
  readings: READING_COLUMNS,
  sessions: SESSION_COLUMNS,
  quotes: QUOTE_COLUMNS,
};

/** The header row of a collection's CSV. */
export const csvHeaders = (collection: CsvCollection): string[] => COLUMNS[collection].map(([header]) => header);

/**
 * A collection as CSV after RFC 4180: CRLF between records, a field in double quotes when it
 * holds a comma, a quote or a line break, quotes doubled inside; a UTF-8 BOM in front for
 * spreadsheets. Deleted rows are left out. `books` gives each row's book title.
 */
export function collectionCsv(collection: CsvCollection, rows: readonly Record<string, unknown>[], books: readonly Book[] = []): string {
  const titles = new Map(books.map((book) => [book.id, book.title ?? '']));
  const titleOf = (bookId: unknown) => (typeof bookId === 'string' ? (titles.get(bookId) ?? '') : '');
  const columns = COLUMNS[collection] as readonly Column<Record<string, unknown>>[];
  const data = rows.filter((row) => row['deleted'] !== true).map((row) => columns.map(([, value]) => value(row, titleOf) ?? ''));
  const csv = Papa.unparse({ fields: columns.map(([header]) => header), data }, { newline: '\r\n', quotes: false, quoteChar: '"', escapeChar: '"' });
  return `${UTF8_BOM}${csv}\r\n`;
}
