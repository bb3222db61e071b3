import { isbn10CheckDigit } from './isbn10-check-digit';

/**
 * The ISBN-10 of a 978 ISBN-13 (ISO 2108: drop the prefix and the check digit, compute the
 * ISBN-10 check character), or null for 979 ISBNs, which have none.
 */
export function isbn13To10(isbn13: string): string | null {
  if (!/^978\d{10}$/.test(isbn13)) return null;
  const body = isbn13.slice(3, 12);
  return body + isbn10CheckDigit(body);
}
