import { parseHlc } from '@shared/sync/hlc';
import type { LocalRow } from '@shared/sync/local-row';
import { lightPlainText, parseLightFormat } from '@shared/journal/light-format';
import { byPosition } from '@shared/journal/page-order';
import { ownTemplates, type TemplateView } from '@shared/journal/starter-templates';

import { isCurrent, type JournalDb, type StoredRow } from '../../core/data/journal-db';

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
export function summarizeNotebooks(
  notebooks: readonly StoredRow<'notebooks'>[],
  pages: readonly StoredRow<'notebookPages'>[],
  books: readonly StoredRow<'books'>[],
): NotebookSummary[] {
  const pagesOf = new Map<string, StoredRow<'notebookPages'>[]>();
  for (const page of pages) {
    const notebookId = page.notebookId;
    if (notebookId) pagesOf.set(notebookId, [...(pagesOf.get(notebookId) ?? []), page]);
  }
  const bookTitles = new Map(books.filter(isCurrent).map((book) => [book.id, book.title ?? '']));
  return notebooks
    .filter(isCurrent)
    .map((notebook) => {
      const own = pagesOf.get(notebook.id) ?? [];
      const bookId = notebook.bookId ?? null;
      return {
        id: notebook.id,
        title: notebook.title ?? '',
        bookId,
        bookTitle: bookId ? (bookTitles.get(bookId) ?? null) : null,
        pageCount: own.filter(isCurrent).length,
        // Deleted pages count: deleting one is an edit too.
        lastEdited: lastEdited([notebook, ...own]),
      };
    })
    .sort((a, b) => (b.lastEdited ?? 0) - (a.lastEdited ?? 0) || a.title.localeCompare(b.title));
}

/** Books for a chooser, by title; deleted ones left out. */
export function bookOptions(books: readonly StoredRow<'books'>[]): BookOption[] {
  return books
    .filter(isCurrent)
    .map((book) => ({ id: book.id, title: book.title || 'Untitled' }))
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

/** The reader's notebooks as the list shows them (see `summarizeNotebooks`). */
export async function notebookSummaries(db: JournalDb): Promise<NotebookSummary[]> {
  const [notebooks, pages, books] = await Promise.all([db.rows('notebooks').toArray(), db.rows('notebookPages').toArray(), db.rows('books').toArray()]);
  return summarizeNotebooks(notebooks, pages, books);
}

/** The books to choose from when starting a notebook. */
export async function bookChoices(db: JournalDb): Promise<BookOption[]> {
  return bookOptions(await db.rows('books').toArray());
}

/** The reader's own page templates. */
export async function ownPageTemplates(db: JournalDb): Promise<TemplateView[]> {
  return ownTemplates(await db.rows('pageTemplates').toArray());
}

/** The notebooks attached to one book, with their page counts. */
export async function notebooksAbout(db: JournalDb, bookId: string): Promise<NotebookSummary[]> {
  const notebooks = await db.rows('notebooks').where('bookId').equals(bookId).toArray();
  const pages = await db
    .rows('notebookPages')
    .where('notebookId')
    .anyOf(notebooks.map((notebook) => notebook.id))
    .toArray();
  return summarizeNotebooks(notebooks, pages, []);
}

const EXCERPT_LENGTH = 160;

/** One notebook: the row, its pages in order with an excerpt each, the book choices and the reader's templates. */
export async function notebookContents(db: JournalDb, id: string) {
  const [notebook, pages, books, templates] = await Promise.all([
    db.rows('notebooks').get(id),
    db.rows('notebookPages').where('notebookId').equals(id).filter(isCurrent).toArray(),
    db.rows('books').toArray(),
    db.rows('pageTemplates').toArray(),
  ]);
  return {
    notebook,
    pages: byPosition(pages).map((page) => ({ id: page.id, title: page.title ?? '', excerpt: excerpt(page.body ?? '') })),
    books: bookOptions(books),
    templates: ownTemplates(templates),
  };
}

/** The first words of a page, without formatting marks. */
function excerpt(body: string): string {
  // Lines and blocks run on, with a dot between them so headings and items stay apart.
  const text = lightPlainText(parseLightFormat(body.slice(0, EXCERPT_LENGTH * 4)))
    .split('\n')
    .map((line) => line.replace(/\s+/g, ' ').trim())
    .filter(Boolean)
    .join(' · ');
  return text.length > EXCERPT_LENGTH ? `${text.slice(0, EXCERPT_LENGTH - 1).trimEnd()}…` : text;
}
