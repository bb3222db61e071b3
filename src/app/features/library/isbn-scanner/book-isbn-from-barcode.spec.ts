import { bookIsbnFromBarcode, readBookBarcode } from './book-isbn-from-barcode';

describe('bookIsbnFromBarcode', () => {
  it("takes the barcode of the ISBN Users' Manual examples as their ISBN-13 digits", () => {
    // ISBN Users' Manual (International ISBN Agency): 978-92-95055-12-4, and 0-8436-1072-7 whose
    // ISBN-13 978-0-8436-1072-7 is what its barcode carries (check digit 7 worked by hand in
    // shared/isbn/is-valid-isbn13.spec.ts).
    expect(bookIsbnFromBarcode('9789295055124')).toBe('9789295055124');
    expect(bookIsbnFromBarcode('9780843610727')).toBe('9780843610727');
  });

  it('takes a 979 code too, the second Bookland prefix', () => {
    // 979-10-1234-567 + check digit: 9+21+9+3+0+3+2+9+4+15+6+21 = 102; 110 − 102 = 8 (by hand,
    // GS1 General Specifications §7.9.1 weights 1,3,1,3,… from the left for 12 digits).
    expect(bookIsbnFromBarcode('9791012345678')).toBe('9791012345678');
  });

  it('ignores the trailing newline some detectors send', () => {
    expect(bookIsbnFromBarcode('9789295055124\n')).toBe('9789295055124');
  });

  it("refuses GS1's own check digit example: a valid EAN-13, but not a book", () => {
    // GS1 General Specifications §7.9.1 worked example 629104150021 → 3 (from memory; the same
    // example is on GS1 Hong Kong's check digit calculator page).
    expect(readBookBarcode('6291041500213')).toEqual({ kind: 'not-a-book' });
    expect(bookIsbnFromBarcode('6291041500213')).toBeNull();
  });

  it('refuses other products and serials, which also carry EAN-13s', () => {
    // Wikipedia "International Article Number" example 4006381333931 (from memory).
    expect(readBookBarcode('4006381333931')).toEqual({ kind: 'not-a-book' });
    // A UPC-A read as EAN-13 gains a leading 0: Wikipedia "Universal Product Code" example
    // 036000291452 (from memory), check digit 2 as in shared/isbn/gs1-check-digit.spec.ts.
    expect(readBookBarcode('0036000291452')).toEqual({ kind: 'not-a-book' });
    // A magazine's barcode: prefix 977 + ISSN 0317-847 + 00 + check digit 1, Wikipedia
    // "International Standard Serial Number" example (from memory; check digit 1 re-worked by hand).
    expect(readBookBarcode('9770317847001')).toEqual({ kind: 'not-a-book' });
  });

  it('treats a wrong check digit or a partial read as a misread, never as an ISBN', () => {
    // The Manual's 978-92-95055-12-4 with the last digit changed: §7.9.1 catches every single-digit error.
    expect(readBookBarcode('9789295055125')).toEqual({ kind: 'misread' });
    expect(readBookBarcode('978929505512')).toEqual({ kind: 'misread' });
    expect(readBookBarcode('97892950551240')).toEqual({ kind: 'misread' });
    expect(readBookBarcode('978-92-95055-12-4')).toEqual({ kind: 'misread' });
    expect(readBookBarcode('')).toEqual({ kind: 'misread' });
    expect(bookIsbnFromBarcode('9789295055125')).toBeNull();
  });
});
