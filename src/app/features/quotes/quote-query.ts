import type { Book, Quote } from '@shared/sync/schema/collections';
import { foldSearchText as fold } from '@shared/text/fold-search-text';

/** What the quotes screen is asked to show. */
export interface QuoteQuery {
  readonly text: string;
  /** Only quotes carrying every one of these labels. */
  readonly labelIds: readonly string[];
  readonly favouritesOnly: boolean;
}

/** The words a quote is found by: its text, note, chapter and tags, and its book's title and authors; folded. */
export function quoteSearchText(quote: Quote, book: Book | undefined): string {
  return fold([quote.text, quote.note, quote.chapter, ...(quote.tags ?? []), book?.title, book?.subtitle, ...(book?.authors ?? [])].join(' '));
}

/**
 * Filters quotes for the quotes screen, newest first. Every word typed must appear somewhere in
 * the quote's search text.
 *
 * @param index search text per quote id (built once per change of quotes or books, not per keystroke)
 */
export function queryQuotes(quotes: readonly Quote[], index: ReadonlyMap<string, string>, query: QuoteQuery): Quote[] {
  const words = fold(query.text).split(/\s+/).filter(Boolean);
  return quotes
    .filter(
      (quote) =>
        (!query.favouritesOnly || quote.favourite === true) &&
        query.labelIds.every((id) => quote.labelIds?.includes(id)) &&
        words.every((word) => (index.get(quote.id) ?? '').includes(word)),
    )
    .sort(newestFirst);
}

/** By capture time, newest first; quotes without one (still arriving) last. */
export function newestFirst(a: Quote, b: Quote): number {
  return (b.capturedAt ?? '').localeCompare(a.capturedAt ?? '') || a.id.localeCompare(b.id);
}
