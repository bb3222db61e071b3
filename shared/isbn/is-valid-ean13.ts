import { gs1CheckDigit } from './gs1-check-digit';

/**
 * Whether a scanned barcode value is an EAN-13 (GTIN-13) with a correct GS1 modulo-10 check
 * digit (GS1 General Specifications §7.9.1). Any GS1 prefix is accepted; use
 * `isValidIsbn13` to know whether it is a book. Surrounding whitespace (a scanner's trailing
 * newline) is ignored, but nothing inside: a scanner sends bare digits.
 *
 * @example
 * isValidEan13('6291041500213') // true
 * isValidEan13('6291041500214') // false
 */
export function isValidEan13(s: string): boolean {
  const digits = s.trim();
  if (!/^\d{13}$/.test(digits)) return false;
  return gs1CheckDigit(digits.slice(0, 12)) === Number(digits[12]);
}
