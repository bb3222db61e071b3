import { normalizeIsbn } from '@shared/isbn/normalize-isbn';
import type { Book } from '@shared/sync/schema/collections';
import type { PatchOf } from '@shared/sync/schema/collection';
import type { books } from '@shared/sync/schema/collections';

/** The editor's form values: what the inputs hold, as text where the reader types text. */
export interface BookFormValue {
  title: string;
  authors: string;
  format: NonNullable<Book['format']>;
  status: NonNullable<Book['status']>;
  rating: string;
  pageCount: string;
  isbn: string;
  coverId: string | null;
}

export const EMPTY_BOOK_FORM: BookFormValue = {
  title: '',
  authors: '',
  format: 'print',
  status: 'tbr',
  rating: '',
  pageCount: '',
  isbn: '',
  coverId: null,
};

/** A stored book as form values. */
export function toFormValue(book: Book): BookFormValue {
  return {
    title: book.title ?? '',
    authors: (book.authors ?? []).join(', '),
    format: book.format ?? 'print',
    status: book.status ?? 'tbr',
    rating: book.rating == null ? '' : String(book.rating),
    pageCount: book.pageCount == null ? '' : String(book.pageCount),
    isbn: book.isbn ?? '',
    coverId: book.coverId ?? null,
  };
}

/** Form values as field values: authors split on commas, blanks as null, ISBN-10 as ISBN-13. */
export function toFields(value: BookFormValue): PatchOf<typeof books> {
  return {
    title: value.title.trim(),
    authors: value.authors
      .split(/[,\n]/)
      .map((name) => name.trim())
      .filter(Boolean),
    format: value.format,
    status: value.status,
    rating: value.rating === '' ? null : Number(value.rating),
    pageCount: value.pageCount.trim() === '' ? null : Number(value.pageCount),
    isbn: value.isbn.trim() === '' ? null : (normalizeIsbn(value.isbn) ?? value.isbn.trim()),
    coverId: value.coverId,
  };
}

/**
 * Only the fields the reader changed since the form was filled. Sending the rest would stamp
 * them with a new clock and overwrite edits that arrived from other devices meanwhile.
 */
export function changedFields(before: BookFormValue, after: BookFormValue): PatchOf<typeof books> {
  const old = toFields(before);
  const next = toFields(after);
  return Object.fromEntries(
    Object.entries(next).filter(([field, value]) => JSON.stringify(value) !== JSON.stringify(old[field as keyof typeof old])),
  ) as PatchOf<typeof books>;
}
