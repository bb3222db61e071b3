import { normalizeIsbn } from '@shared/isbn/normalize-isbn';
import type { PatchOf } from '@shared/sync/schema/collection';
import type { Book, books } from '@shared/sync/schema/collections';
import { optionalText, splitList } from '@shared/text/form-text';

/** The editor's form values: what the inputs hold, as text where the reader types text. */
export interface BookFormValue {
  title: string;
  subtitle: string;
  authors: string;
  format: NonNullable<Book['format']>;
  pageCount: string;
  audioMinutes: string;
  status: NonNullable<Book['status']>;
  copy: NonNullable<Book['copy']> | '';
  rating: string;
  isbn: string;
  publisher: string;
  year: string;
  language: string;
  genres: string;
  tags: string;
  labelIds: string[];
  seriesId: string;
  seriesPosition: string;
  dnfProgress: string;
  dnfUnit: NonNullable<Book['dnfUnit']> | '';
  dnfOn: string;
  dnfReason: string;
  wishPriority: NonNullable<Book['wishPriority']> | '';
  wishWhere: string;
  wishPriceNote: string;
  releaseDate: string;
  preordered: boolean;
  coverId: string | null;
}

export const EMPTY_BOOK_FORM: BookFormValue = {
  title: '',
  subtitle: '',
  authors: '',
  format: 'print',
  pageCount: '',
  audioMinutes: '',
  status: 'tbr',
  copy: 'owned',
  rating: '',
  isbn: '',
  publisher: '',
  year: '',
  language: '',
  genres: '',
  tags: '',
  labelIds: [],
  seriesId: '',
  seriesPosition: '',
  dnfProgress: '',
  dnfUnit: '',
  dnfOn: '',
  dnfReason: '',
  wishPriority: '',
  wishWhere: '',
  wishPriceNote: '',
  releaseDate: '',
  preordered: false,
  coverId: null,
};

const text = (value: string | null | undefined) => value ?? '';
const number = (value: number | null | undefined) => (value == null ? '' : String(value));
const list = (value: readonly string[] | undefined) => (value ?? []).join(', ');

/** A stored book as form values. */
export function toFormValue(book: Book): BookFormValue {
  return {
    title: text(book.title),
    subtitle: text(book.subtitle),
    authors: list(book.authors),
    format: book.format ?? 'print',
    pageCount: number(book.pageCount),
    audioMinutes: number(book.audioMinutes),
    status: book.status ?? 'tbr',
    copy: book.copy ?? '',
    rating: number(book.rating),
    isbn: text(book.isbn),
    publisher: text(book.publisher),
    year: number(book.year),
    language: text(book.language),
    genres: list(book.genres),
    tags: list(book.tags),
    labelIds: [...(book.labelIds ?? [])],
    seriesId: text(book.seriesId),
    seriesPosition: number(book.seriesPosition),
    dnfProgress: number(book.dnfProgress),
    dnfUnit: book.dnfUnit ?? '',
    dnfOn: text(book.dnfOn),
    dnfReason: text(book.dnfReason),
    wishPriority: book.wishPriority ?? '',
    wishWhere: text(book.wishWhere),
    wishPriceNote: text(book.wishPriceNote),
    releaseDate: text(book.releaseDate),
    preordered: book.preordered ?? false,
    coverId: book.coverId ?? null,
  };
}

/** A decimal comma ("2,5") reads as a point: the editor's decimal fields accept either. */
const optionalNumber = (value: string) => (value.trim() === '' ? null : Number(value.trim().replace(',', '.')));

/** Form values as field values: lists split on commas, blanks as null, ISBN-10 as ISBN-13. */
export function toFields(value: BookFormValue): PatchOf<typeof books> {
  return {
    title: value.title.trim(),
    subtitle: optionalText(value.subtitle),
    authors: splitList(value.authors),
    format: value.format,
    pageCount: optionalNumber(value.pageCount),
    audioMinutes: optionalNumber(value.audioMinutes),
    status: value.status,
    copy: value.copy === '' ? null : value.copy,
    rating: optionalNumber(value.rating),
    isbn: value.isbn.trim() === '' ? null : (normalizeIsbn(value.isbn) ?? value.isbn.trim()),
    publisher: optionalText(value.publisher),
    year: optionalNumber(value.year),
    language: optionalText(value.language),
    genres: splitList(value.genres),
    tags: splitList(value.tags),
    labelIds: value.labelIds,
    seriesId: optionalText(value.seriesId),
    seriesPosition: optionalNumber(value.seriesPosition),
    dnfProgress: optionalNumber(value.dnfProgress),
    dnfUnit: value.dnfUnit === '' ? null : value.dnfUnit,
    dnfOn: optionalText(value.dnfOn),
    dnfReason: optionalText(value.dnfReason),
    wishPriority: value.wishPriority === '' ? null : value.wishPriority,
    wishWhere: optionalText(value.wishWhere),
    wishPriceNote: optionalText(value.wishPriceNote),
    releaseDate: optionalText(value.releaseDate),
    preordered: value.preordered,
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
  return Object.fromEntries(Object.entries(next).filter(([field, value]) => JSON.stringify(value) !== JSON.stringify(old[field as keyof typeof old]))) as PatchOf<
    typeof books
  >;
}
