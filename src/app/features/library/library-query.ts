import equal from 'fast-deep-equal';

import type { Book } from '@shared/sync/schema/collections';
import { bookKeys, findDuplicates } from '@shared/duplicates/book-keys';
import { foldSearchText as fold } from '@shared/text/fold-search-text';

/** What the library view is asked to show. */
export interface LibraryQuery {
  readonly text: string;
  readonly status: NonNullable<Book['status']> | 'all';
  /** Only books with this label; `null` for any. */
  readonly labelId?: string | null;
  readonly sort: { readonly by: LibrarySortKey; readonly direction: 'asc' | 'desc' };
}

export type LibrarySortKey = 'title' | 'authors' | 'format' | 'status' | 'rating' | 'changed';

const collator = new Intl.Collator(undefined, { sensitivity: 'base', numeric: true });

/** The words a book is found by: title, subtitle, authors, ISBN, tags; lower-cased, accents folded. */
export function searchText(book: Book): string {
  return fold([book.title, book.subtitle, ...(book.authors ?? []), book.isbn, ...(book.tags ?? []), ...(book.genres ?? [])].join(' '));
}

/** A book with what the library finds and sorts it by, worked out once per change of that book. */
export interface LibraryRow {
  readonly book: Book;
  readonly search: string;
  readonly keys: Readonly<Record<LibrarySortKey, string | number | null>>;
  /** Where the book may meet a duplicate (ISBN-13, normalised title and first author). */
  readonly duplicateKeys: readonly string[];
}

export function libraryRow(book: Book, search = searchText(book)): LibraryRow {
  const keys = Object.fromEntries(Object.entries(SORT_KEYS).map(([by, key]) => [by, key(book)])) as Record<LibrarySortKey, string | number | null>;
  return { book, search, keys, duplicateKeys: bookKeys(book) };
}

/** How many books look entered twice or more (every book of each duplicate group), from the rows' kept keys. */
export function duplicateBookCount(rows: readonly LibraryRow[]): number {
  return findDuplicates(
    rows.map((row) => ({ id: row.book.id, keys: row.duplicateKeys })),
    (row) => row.keys,
  ).reduce((sum, group) => sum + group.length, 0);
}

/**
 * The library's rows, keyed by book id: a book equal to the one seen last time keeps its row
 * (and its object, so a table tracking rows re-renders only the books that changed), and only
 * changed books get their search text and sort keys worked out again.
 */
export class LibraryRows {
  private byId = new Map<string, LibraryRow>();

  update(books: readonly Book[]): LibraryRow[] {
    const next = new Map<string, LibraryRow>();
    for (const book of books) {
      const old = this.byId.get(book.id);
      next.set(book.id, old && sameBook(old.book, book) ? old : libraryRow(book));
    }
    this.byId = next;
    return [...next.values()];
  }
}

/**
 * Sorts rows, starting from the order it gave last time: after a pulled page or a write, the
 * rows are nearly in order already, and the engine's merge sort (TimSort) then needs about one
 * comparison per row instead of n log n.
 */
export class LibrarySorter {
  private last: { by: LibrarySortKey; direction: string; ids: string[] } | null = null;

  sort(rows: readonly LibraryRow[], sort: LibraryQuery['sort']): LibraryRow[] {
    let start: LibraryRow[] = [...rows];
    if (this.last?.by === sort.by && this.last.direction === sort.direction) {
      const byId = new Map(rows.map((row) => [row.book.id, row]));
      const kept = this.last.ids.flatMap((id) => byId.get(id) ?? []);
      const keptIds = new Set(this.last.ids);
      start = [...kept, ...rows.filter((row) => !keptIds.has(row.book.id))];
    }
    const sorted = sortRows(start, sort);
    this.last = { ...sort, ids: sorted.map((row) => row.book.id) };
    return sorted;
  }
}

/** Sorts rows by a column; blanks (no rating yet, say) go last whichever way it is sorted. */
export function sortRows(rows: LibraryRow[], sort: LibraryQuery['sort']): LibraryRow[] {
  const sign = sort.direction === 'asc' ? 1 : -1;
  return rows.sort((a, b) => {
    const [ka, kb] = [a.keys[sort.by], b.keys[sort.by]];
    if (ka === null || kb === null) return ka === kb ? titleOrder(a, b) : ka === null ? 1 : -1;
    return sign * compare(ka, kb) || titleOrder(a, b);
  });
}

/**
 * The rows a query asks for, in the order given. Every word typed must appear somewhere in the
 * book's search text; an ISBN may be typed with hyphens.
 */
export function filterRows(rows: readonly LibraryRow[], query: Omit<LibraryQuery, 'sort'>): Book[] {
  const words = fold(query.text)
    .split(/\s+/)
    .map((word) => (/^[\d-]+x?$/.test(word) ? word.replace(/-/g, '') : word))
    .filter(Boolean);
  const found: Book[] = [];
  for (const { book, search } of rows) {
    if (query.status !== 'all' && book.status !== query.status) continue;
    if (query.labelId && !(book.labelIds ?? []).includes(query.labelId)) continue;
    if (words.every((word) => search.includes(word))) found.push(book);
  }
  return found;
}

/**
 * Filters and sorts books for the library (the screen keeps rows and order between changes with
 * {@link LibraryRows} and {@link LibrarySorter}; this is the same in one call).
 *
 * @param index search text per book id
 */
export function queryLibrary(books: readonly Book[], index: ReadonlyMap<string, string>, query: LibraryQuery): Book[] {
  return filterRows(
    sortRows(
      books.map((book) => libraryRow(book, index.get(book.id) ?? '')),
      query.sort,
    ),
    query,
  );
}

/**
 * Two versions of a book hold the same values (rows from IndexedDB are fresh objects each time).
 * Asked of every book on every re-read: a structural compare, not JSON text of each field.
 */
const sameBook = (a: Book, b: Book): boolean => equal(a, b);

const STATUS_ORDER = ['reading', 'paused', 'tbr', 'finished', 'dnf'];
const SORT_KEYS: Record<LibrarySortKey, (book: Book) => string | number | null> = {
  title: (book) => book.title ?? '',
  authors: (book) => lastName(book.authors?.[0]),
  format: (book) => book.format ?? '',
  status: (book) => STATUS_ORDER.indexOf(book.status ?? ''),
  rating: (book) => book.rating ?? null,
  changed: (book) => book.statusChangedAt ?? null,
};

/** Authors sort by surname (the last word of the name), as shelves usually do. */
function lastName(name: string | undefined): string {
  const words = (name ?? '').trim().split(/\s+/);
  return `${words.at(-1) ?? ''} ${words.join(' ')}`;
}

function compare(a: string | number, b: string | number): number {
  if (a === b) return 0;
  return typeof a === 'number' && typeof b === 'number' ? a - b : collator.compare(String(a), String(b));
}

const titleOrder = (a: LibraryRow, b: LibraryRow) => collator.compare(a.book.title ?? '', b.book.title ?? '');
