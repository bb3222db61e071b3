/**
 * Check digits written out from the standards for the specs, on purpose apart from our own
 * `isbn10CheckDigit`/`gs1CheckDigit`, so a generator built on them cannot share a mistake with
 * the code under test.
 */

/** ISO 2108 (ISBN Users' Manual, ISBN-10): weights 10 down to 2; the check makes the sum ≡ 0 mod 11; 10 is written X. */
export function standardIsbn10CheckDigit(nineDigits: string): string {
  const weights = [10, 9, 8, 7, 6, 5, 4, 3, 2];
  const sum = weights.reduce((total, weight, i) => total + weight * Number(nineDigits.charAt(i)), 0);
  const check = (11 - (sum % 11)) % 11;
  return check === 10 ? 'X' : String(check);
}

/** GS1 General Specifications §7.9.1 (EAN-13 / ISBN-13): weights 1, 3, 1, 3… from the left; the check tops the sum up to a multiple of 10. */
export function standardEan13CheckDigit(twelveDigits: string): string {
  const weights = [1, 3, 1, 3, 1, 3, 1, 3, 1, 3, 1, 3];
  const sum = weights.reduce((total, weight, i) => total + weight * Number(twelveDigits.charAt(i)), 0);
  return String((10 - (sum % 10)) % 10);
}

/** `isbn` with the digit at `at` moved up by `shift` (1–9, mod 10): one wrong digit, as a typing slip makes. */
export function withDigitShifted(isbn: string, at: number, shift: number): string {
  return isbn.slice(0, at) + String((Number(isbn[at]) + shift) % 10) + isbn.slice(at + 1);
}
