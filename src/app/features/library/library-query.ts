import type { Book } from '@shared/sync/schema/collections';
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

/**
 * Filters and sorts books for the library. Every word typed must appear somewhere in the book's
 * search text; an ISBN may be typed with hyphens.
 *
 * @param index search text per book id (built once per change of the library, not per keystroke)
 */
export function queryLibrary(books: readonly Book[], index: ReadonlyMap<string, string>, query: LibraryQuery): Book[] {
  const words = fold(query.text)
    .split(/\s+/)
    .map((word) => (/^[\d-]+x?$/.test(word) ? word.replace(/-/g, '') : word))
    .filter(Boolean);
  const matches = books.filter(
    (book) =>
      (query.status === 'all' || book.status === query.status) &&
      (!query.labelId || (book.labelIds ?? []).includes(query.labelId)) &&
      words.every((word) => (index.get(book.id) ?? '').includes(word)),
  );
  const sign = query.sort.direction === 'asc' ? 1 : -1;
  const key = SORT_KEYS[query.sort.by];
  return matches.sort((a, b) => {
    const [ka, kb] = [key(a), key(b)];
    // Blanks (no rating yet, say) go last whichever way the column is sorted.
    if (ka === null || kb === null) return ka === kb ? titleOrder(a, b) : ka === null ? 1 : -1;
    return sign * compare(ka, kb) || titleOrder(a, b);
  });
}

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

const titleOrder = (a: Book, b: Book) => collator.compare(a.title ?? '', b.title ?? '');
