/**
 * The catalogue look-up API (`GET /api/catalogue/isbn/:isbn`, `GET /api/catalogue/search?q=`):
 * book details from library catalogues, read from MARC 21 records on the server.
 */

/** A book's format as the catalogue record tells it (leader, 007, 300, 338). */
export type CatalogueFormat = 'print' | 'ebook' | 'audiobook';

/** One catalogue record, as fields of a book. Every field may be missing from a record. */
export interface CatalogueBook {
  /** ISBN-13 digits: the one looked up when the record carries it, else the record's first valid one. */
  readonly isbn: string | null;
  /** Every valid ISBN of the record, as ISBN-13 digits (a record may list paperback and hardback). */
  readonly isbns: readonly string[];
  readonly title: string;
  readonly subtitle: string | null;
  /** Display forms ("Juniper Asquith"), main entry first. */
  readonly authors: readonly string[];
  readonly edition: string | null;
  readonly publisher: string | null;
  readonly year: number | null;
  readonly format: CatalogueFormat;
  readonly pageCount: number | null;
  readonly audioMinutes: number | null;
  readonly series: string | null;
  readonly seriesPosition: number | null;
  /** A language tag (`en`, `fr`, or the MARC code when it has no two-letter form). */
  readonly language: string | null;
  /** Subject headings, offered as genres. */
  readonly subjects: readonly string[];
  readonly summary: string | null;
}

/** The answer of both routes. `source` is the catalogue that answered (its host), or `cache`. */
export interface CatalogueAnswer {
  readonly books: readonly CatalogueBook[];
  readonly source: string;
}

/** Error codes of the catalogue routes besides `invalid_input` and `too_many_attempts`. */
export const CATALOGUE_ERROR_CODES = ['no_match', 'catalogue_timeout', 'catalogue_unavailable', 'catalogue_malformed'] as const;

export type CatalogueErrorCode = (typeof CATALOGUE_ERROR_CODES)[number];
