import { BOOK_FORMATS } from '../sync/schema/collections';

/** Books per format. */
export type FormatSplit = Readonly<Record<(typeof BOOK_FORMATS)[number], number>>;

/**
 * How many of `books` are print, ebook and audiobook. A book without a known format is left out.
 *
 * @example
 * formatSplit([{ format: 'print' }, { format: 'audiobook' }, { format: 'print' }]) // { print: 2, ebook: 0, audiobook: 1 }
 */
export function formatSplit(books: readonly { readonly format?: string | null }[]): FormatSplit {
  const split = { print: 0, ebook: 0, audiobook: 0 };
  for (const { format } of books) {
    if (format === 'print' || format === 'ebook' || format === 'audiobook') split[format] += 1;
  }
  return split;
}
