import { compactIsbn } from './compact-isbn';
import { gs1CheckDigit } from './gs1-check-digit';
import { isValidIsbn10 } from './is-valid-isbn10';

/**
 * The ISBN-13 (digits only) of a valid ISBN-10: prefix 978, the same 9-digit body, and a new
 * GS1 check digit (the ISBN-10 check character is dropped, not reused). Null when the input is
 * not a valid ISBN-10.
 *
 * @example
 * isbn10To13('0-8436-1072-7') // '9780843610727'
 */
export function isbn10To13(s: string): string | null {
  if (!isValidIsbn10(s)) return null;
  const body = '978' + compactIsbn(s).slice(0, 9);
  return body + String(gs1CheckDigit(body));
}
