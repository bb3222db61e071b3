import { compactIsbn } from './compact-isbn';
import { gs1CheckDigit } from './gs1-check-digit';

/**
 * Whether a string is an ISBN-13: 13 digits starting with the GS1 "Bookland" prefix 978 or 979
 * (but not 979-0, which is the ISMN's),
 * with a correct GS1 modulo-10 check digit. Hyphens and spaces anywhere are ignored.
 *
 * @example
 * isValidIsbn13('978-92-95055-12-4') // true
 * isValidIsbn13('978-92-95055-12-5') // false
 */
export function isValidIsbn13(s: string): boolean {
  const compact = compactIsbn(s);
  // Other GS1 prefixes give valid EAN-13s (a tin of beans) but not ISBNs; 979-0 is the ISMN
  // range for printed music (ISO 10957), not books.
  if (!/^97[89]\d{10}$/.test(compact) || compact.startsWith('9790')) return false;
  return gs1CheckDigit(compact.slice(0, 12)) === Number(compact[12]);
}
