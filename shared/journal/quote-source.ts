import type { Book, Quote } from '../sync/schema/collections';
import { formatAudioPosition } from './audio-position';
import { authorLine } from './author-line';

/** What a source line needs of the book. */
export type QuoteSourceBook = Pick<Book, 'title' | 'authors' | 'format'>;

/** What a source line needs of the quote. */
export type QuotePositionFields = Pick<Quote, 'page' | 'ebookLocation' | 'audioSeconds'>;

/**
 * Where a quote is, in its book's own unit: "p. 42", "loc. 1234", "37%" or "1:02:30". The
 * field matching the book's format wins; without a format (or when that field is empty), the
 * first one set.
 */
export function quotePosition(quote: QuotePositionFields, format?: Book['format']): string {
  const page = quote.page != null ? `p. ${quote.page}` : '';
  const audio = quote.audioSeconds != null ? formatAudioPosition(quote.audioSeconds) : '';
  const location = ebookLocationLine(quote.ebookLocation);
  const byFormat = format === 'audiobook' ? audio : format === 'ebook' ? location : format === 'print' ? page : '';
  return byFormat || page || location || audio;
}

/** "1234" reads as a location, "37%" as it is, anything else as the reader typed it. */
function ebookLocationLine(location: string | null | undefined): string {
  const typed = location?.trim() ?? '';
  return /^\d+$/.test(typed) ? `loc. ${typed}` : typed;
}

/**
 * A quote as plain text for pasting elsewhere: the passage in curly quotes, then a source line
 * of author, title and position.
 *
 * @example
 * quoteWithSource({ text: 'Salt keeps.', page: 42 }, { title: 'The Salt Road Almanac', authors: ['Ada Pell'], format: 'print' })
 * // '“Salt keeps.”\n— Ada Pell, The Salt Road Almanac, p. 42'
 */
export function quoteWithSource(quote: QuotePositionFields & Pick<Quote, 'text'>, book?: QuoteSourceBook | null): string {
  const passage = `“${stripQuotes(quote.text ?? '')}”`;
  const source = [authorLine(book?.authors), book?.title?.trim(), quotePosition(quote, book?.format)].filter(Boolean).join(', ');
  return source ? `${passage}\n— ${source}` : passage;
}

/** A passage pasted with its own quotation marks would otherwise get two pairs. */
function stripQuotes(text: string): string {
  const trimmed = text.trim();
  const match = /^["“„«](.*)["”“»]$/su.exec(trimmed);
  return (match?.[1] ?? trimmed).trim();
}
