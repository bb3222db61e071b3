import type { CatalogueBook, CatalogueFormat } from '@shared/api/catalogue';
import { normalizeIsbn } from '@shared/isbn/normalize-isbn';

/** The book editor's fields a catalogue record can fill, as the text its inputs hold. */
export const FILLABLE_FIELDS = ['title', 'subtitle', 'authors', 'format', 'pageCount', 'audioMinutes', 'isbn', 'publisher', 'year', 'language', 'genres'] as const;

export type FillableField = (typeof FILLABLE_FIELDS)[number];
export type FillValues = Readonly<Record<FillableField, string>>;

export const FIELD_LABELS: Readonly<Record<FillableField, string>> = {
  title: 'Title',
  subtitle: 'Subtitle',
  authors: 'Authors',
  format: 'Format',
  pageCount: 'Page count',
  audioMinutes: 'Length in minutes',
  isbn: 'ISBN',
  publisher: 'Publisher',
  year: 'Year',
  language: 'Language',
  genres: 'Genres',
};

export const CATALOGUE_FORMAT_LABELS: Readonly<Record<CatalogueFormat, string>> = { print: 'Print', ebook: 'Ebook', audiobook: 'Audiobook' };

/** One field the reader may take from the catalogue, and whether it would replace what they typed. */
export interface FillChoice {
  readonly field: FillableField;
  readonly label: string;
  /** The catalogue's value as the input would hold it. */
  readonly offered: string;
  /** The same value as a reader reads it ("Audiobook" for `audiobook`). */
  readonly shown: string;
  readonly current: string;
  /** The field already holds something else: taking the offer needs the reader's say-so. */
  readonly replaces: boolean;
}

const number = (value: number | null) => (value == null ? '' : String(value));

/** A catalogue record as the editor's text values; fields the record lacks are left out. */
export function catalogueValues(book: CatalogueBook): Partial<Record<FillableField, string>> {
  const all: Record<FillableField, string> = {
    title: book.title,
    subtitle: book.subtitle ?? '',
    authors: book.authors.join(', '),
    format: book.format,
    pageCount: book.format === 'audiobook' ? '' : number(book.pageCount),
    audioMinutes: book.format === 'audiobook' ? number(book.audioMinutes) : '',
    isbn: book.isbn ?? '',
    publisher: book.publisher ?? '',
    year: number(book.year),
    language: book.language ?? '',
    genres: book.subjects.join(', '),
  };
  return Object.fromEntries(Object.entries(all).filter(([, value]) => value.trim() !== '')) as Partial<Record<FillableField, string>>;
}

/** Whether two texts say the same for this field (ISBN-10 and ISBN-13 alike, lists in any spacing). */
function same(field: FillableField, a: string, b: string): boolean {
  if (field === 'isbn') return (normalizeIsbn(a) ?? a.trim()) === (normalizeIsbn(b) ?? b.trim());
  const tidy = (text: string) =>
    text
      .split(',')
      .map((part) => part.trim().toLowerCase())
      .filter(Boolean)
      .join(',');
  return tidy(a) === tidy(b);
}

/**
 * What the catalogue offers for a form that holds `current`: only fields where it has a value
 * that differs from what is there. A field the reader left empty is taken by default; one they
 * typed something into is only replaced when they tick it (`replaces`).
 *
 * @example
 * fillChoices({ title: 'Salt and lantern', year: '' }, book) // [{ field: 'year', replaces: false, … }, …]
 */
export function fillChoices(current: Partial<FillValues>, book: CatalogueBook): FillChoice[] {
  const offered = catalogueValues(book);
  return FILLABLE_FIELDS.flatMap((field) => {
    const value = offered[field];
    const now = current[field] ?? '';
    if (value === undefined || same(field, now, value)) return [];
    const shown = field === 'format' ? CATALOGUE_FORMAT_LABELS[value as CatalogueFormat] : value;
    return [{ field, label: FIELD_LABELS[field], offered: value, shown, current: now, replaces: now.trim() !== '' }];
  });
}

/** "2024 · Audiobook · Kestrel & Vane Audio": how a match is told apart from others. */
export function matchLine(book: CatalogueBook): string {
  return [book.year ?? null, CATALOGUE_FORMAT_LABELS[book.format], book.publisher, book.edition].filter((part) => part !== null && part !== '').join(' · ');
}
