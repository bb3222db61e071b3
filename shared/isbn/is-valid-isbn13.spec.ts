import fc from 'fast-check';
import { parse } from 'isbn3';
import { isValidIsbn13 } from './is-valid-isbn13';
import { standardEan13CheckDigit, withDigitShifted } from './testing/standard-check-digits';
import { expectProperty } from '../testing/expect-property';

// 978 and 979 bodies, leaving out 979-0 (the ISMN's range, not ISBNs; ISO 10957).
const validIsbn13 = fc
  .tuple(fc.constantFrom('978', '979'), fc.stringMatching(/^\d{9}$/))
  .filter(([prefix, rest]) => !(prefix === '979' && rest.startsWith('0')))
  .map(([prefix, rest]) => prefix + rest + standardEan13CheckDigit(prefix + rest));

describe('isValidIsbn13', () => {
  it("accepts the ISBN Users' Manual example 978-92-95055-12-4", () => {
    // ISBN Users' Manual (International ISBN Agency), ISBN-13 check digit example.
    expect(isValidIsbn13('978-92-95055-12-4')).toBeTrue();
    expect(isValidIsbn13('978 92 95055 12 4')).toBeTrue();
    expect(isValidIsbn13('9789295055124')).toBeTrue();
  });

  it("accepts the ISBN-13 form of the Manual's 0-8436-1072-7", () => {
    // 978 + 084361072 + new check digit: 9+21+8+0+8+12+3+18+1+0+7+6 = 93; 100 − 93 = 7.
    expect(isValidIsbn13('978-0-8436-1072-7')).toBeTrue();
  });

  it('rejects a wrong check digit, a non-Bookland prefix, an X and a wrong length', () => {
    expect(isValidIsbn13('978-92-95055-12-5')).toBeFalse();
    // A valid EAN-13 (GS1 example, see gs1-check-digit.spec.ts) but not an ISBN: prefix 629.
    expect(isValidIsbn13('6291041500213')).toBeFalse();
    expect(isValidIsbn13('978-0-8044-2957-X')).toBeFalse();
    expect(isValidIsbn13('978-92-95055-12')).toBeFalse();
  });

  it('agrees with isbn3 (npm reference) wherever isbn3 knows the range', () => {
    expectProperty(
      fc.property(validIsbn13, (isbn) => {
        const reference = parse(isbn);
        return isValidIsbn13(isbn) && (reference === null || reference.isbn13 === isbn);
      }),
      { numRuns: 300 },
    );
  });

  it('rejects every single-digit corruption of the body or check digit, as isbn3 does', () => {
    // GS1 General Specifications §7.9: weights 1 and 3 are prime to 10, so a changed digit always shows.
    expectProperty(
      fc.property(validIsbn13, fc.integer({ min: 3, max: 12 }), fc.integer({ min: 1, max: 9 }), (isbn, at, shift) => {
        const corrupted = withDigitShifted(isbn, at, shift);
        return !isValidIsbn13(corrupted) && parse(corrupted) === null;
      }),
      { numRuns: 300 },
    );
  });

  it('refuses 979-0, the range ISO 10957 gives to the ISMN (printed music), though its check digit is right', () => {
    // ISMN example 979-0-2600-0043-8 (from memory of the ISMN Users' Manual); GS1 mod-10 check digit 8.
    expect(isValidIsbn13('9790260000438')).toBeFalse();
  });
});
