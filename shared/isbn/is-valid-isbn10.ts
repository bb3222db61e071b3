import { compactIsbn } from './compact-isbn';
import { isbn10CheckDigit } from './isbn10-check-digit';

/**
 * Whether a string is an ISBN-10 with a correct check character. Hyphens and spaces anywhere
 * are ignored; the check character may be 'X' (or 'x'), and only in the last place.
 *
 * @example
 * isValidIsbn10('0-8436-1072-7') // true
 * isValidIsbn10('0-8436-1072-8') // false
 */
export function isValidIsbn10(s: string): boolean {
  const compact = compactIsbn(s);
  if (!/^\d{9}[\dX]$/.test(compact)) return false;
  return isbn10CheckDigit(compact.slice(0, 9)) === compact[9];
}
