import { parseHlc } from '@shared/sync/hlc';
import type { LocalRow } from '@shared/sync/local-row';
import type { Book, Notebook, NotebookPage } from '@shared/sync/schema/collections';

/** One notebook as the list shows it. */
export interface NotebookSummary {
  readonly id: string;
  readonly title: string;
  readonly bookId: string | null;
  /** The attached book's title; null without a book, or while the book has not arrived here. */
  readonly bookTitle: string | null;
  readonly pageCount: number;
  /** When the notebook or one of its pages last changed, on any device (ms since 1970), if known. */
  readonly lastEdited: number | null;
}

/** A book to choose in a notebook's book chooser. */
export interface BookOption {
  readonly id: string;
  readonly title: string;
}

/**
 * When any of these rows last changed: the greatest wall time among their field clocks. The
 * clocks are kept for the merge anyway, so notebooks need no "edited at" field of their own,
 * and an edit synced from another device counts at the time it was made there.
 */
export function lastEdited(rows: readonly LocalRow[]): number | null {
  let latest: number | null = null;
  for (const row of rows) {
    for (const hlc of Object.values(row._hlc ?? {})) {
      const wall = parseHlc(hlc)?.wall;
      if (wall !== undefined && (latest === null || wall > latest)) latest = wall;
    }
  }
  return latest;
}

/** The reader's notebooks, most recently edited first, with their page counts and books. */
export function summarizeNotebooks(notebooks: readonly LocalRow[], pages: readonly LocalRow[], books: readonly LocalRow[]): NotebookSummary[] {
  const pagesOf = new Map<string, LocalRow[]>();
  for (const page of pages) {
    const notebookId = (page as NotebookPage & LocalRow).notebookId;
    if (notebookId) pagesOf.set(notebookId, [...(pagesOf.get(notebookId) ?? []), page]);
  }
  const bookTitles = new Map(books.filter((book) => !book['deleted']).map((book) => [book.id, (book as Book & LocalRow).title ?? '']));
  return notebooks
    .filter((row) => !row['deleted'])
    .map((row) => {
      const notebook = row as Notebook & LocalRow;
      const own = pagesOf.get(notebook.id) ?? [];
      const bookId = notebook.bookId ?? null;
      return {
        id: notebook.id,
        title: notebook.title ?? '',
        bookId,
        bookTitle: bookId ? (bookTitles.get(bookId) ?? null) : null,
        pageCount: own.filter((page) => !page['deleted']).length,
        // Deleted pages count: deleting one is an edit too.
        lastEdited: lastEdited([notebook, ...own]),
      };
    })
    .sort((a, b) => (b.lastEdited ?? 0) - (a.lastEdited ?? 0) || a.title.localeCompare(b.title));
}

/** Books for a chooser, by title; deleted ones left out. */
export function bookOptions(books: readonly LocalRow[]): BookOption[] {
  return books
    .filter((book) => !book['deleted'])
    .map((book) => ({ id: book.id, title: (book as Book & LocalRow).title || 'Untitled' }))
    .sort((a, b) => a.title.localeCompare(b.title));
}

/**
 * Text cut to at most `max` UTF-16 units (the schema's measure), without splitting a pair of
 * surrogates (an emoji, say) in two.
 */
export function clip(text: string, max: number): string {
  if (text.length <= max) return text;
  const code = text.charCodeAt(max - 1);
  return text.slice(0, code >= 0xd800 && code <= 0xdbff ? max - 1 : max);
}
