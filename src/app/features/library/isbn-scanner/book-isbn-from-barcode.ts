import { isValidEan13 } from '@shared/isbn/is-valid-ean13';
import { isValidIsbn13 } from '@shared/isbn/is-valid-isbn13';

/** What one scanned barcode value means for the ISBN field. */
export type BookBarcode =
  /** A book's ISBN-13 (digits only), ready for the field. */
  | { readonly kind: 'isbn'; readonly isbn: string }
  /** A sound EAN-13 of something that is not a book (a GS1 prefix other than 978/979). */
  | { readonly kind: 'not-a-book' }
  /** Not a whole EAN-13 with a right check digit: most likely a misread frame. */
  | { readonly kind: 'misread' };

/**
 * Sorts a barcode value as read by a detector. An ISBN-13 is an EAN-13 (GS1 General
 * Specifications §7.9.1 check digit) whose prefix is the "Bookland" 978 or 979; any other
 * valid EAN-13 is another product, worth telling the reader about, while a value that fails
 * the check digit is a misread to scan past quietly.
 *
 * @example
 * readBookBarcode('9789295055124') // { kind: 'isbn', isbn: '9789295055124' }
 * readBookBarcode('6291041500213') // { kind: 'not-a-book' }
 * readBookBarcode('9789295055125') // { kind: 'misread' }
 */
export function readBookBarcode(rawValue: string): BookBarcode {
  // Detectors send bare digits, some with a trailing newline; nothing inside is forgiven.
  const digits = rawValue.trim();
  if (!isValidEan13(digits)) return { kind: 'misread' };
  return isValidIsbn13(digits) ? { kind: 'isbn', isbn: digits } : { kind: 'not-a-book' };
}

/**
 * The ISBN-13 digits a scanned barcode carries, or null when it is not a book's ISBN.
 *
 * @example
 * bookIsbnFromBarcode('9789295055124') // '9789295055124'
 * bookIsbnFromBarcode('4006381333931') // null (a valid EAN-13, but not a book)
 */
export function bookIsbnFromBarcode(rawValue: string): string | null {
  const reading = readBookBarcode(rawValue);
  return reading.kind === 'isbn' ? reading.isbn : null;
}
