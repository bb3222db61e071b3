import { compactIsbn } from './compact-isbn';
import { isValidIsbn13 } from './is-valid-isbn13';
import { isbn10To13 } from './isbn10-to-13';

/**
 * One key per book edition: the ISBN-13 digits of a valid ISBN-10 or ISBN-13 however it was
 * typed, or null when it is neither. Storing this form lets '0-8436-1072-7' and
 * '978-0-8436-1072-7' match.
 *
 * @example
 * normalizeIsbn('0-8436-1072-7')     // '9780843610727'
 * normalizeIsbn('978 92 95055 12 4') // '9789295055124'
 * normalizeIsbn('978-92-95055-12-5') // null
 */
export function normalizeIsbn(input: string): string | null {
  const compact = compactIsbn(input);
  if (compact.length === 13) return isValidIsbn13(compact) ? compact : null;
  if (compact.length === 10) return isbn10To13(compact);
  return null;
}
