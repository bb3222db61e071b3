import fc from 'fast-check';
import { parse } from 'isbn3';
import { isValidIsbn10 } from './is-valid-isbn10';
import { standardIsbn10CheckDigit, withDigitShifted } from './testing/standard-check-digits';
import { expectProperty } from '../testing/expect-property';

const validIsbn10 = fc.stringMatching(/^\d{9}$/).map((body) => body + standardIsbn10CheckDigit(body));

describe('isValidIsbn10', () => {
  it("accepts the ISBN Users' Manual example 0-8436-1072-7 however it is spaced", () => {
    // ISBN Users' Manual (International ISBN Agency), ISBN-10 example.
    expect(isValidIsbn10('0-8436-1072-7')).toBeTrue();
    expect(isValidIsbn10('0 8436 1072 7')).toBeTrue();
    expect(isValidIsbn10('0843610727')).toBeTrue();
  });

  it("accepts an 'X' check character, in either case, and only at the end", () => {
    // 0-8044-2957-X (from memory; isbn3 accepts it, see isbn10-check-digit.spec.ts).
    expect(isValidIsbn10('0-8044-2957-X')).toBeTrue();
    expect(isValidIsbn10('0-8044-2957-x')).toBeTrue();
    expect(isValidIsbn10('X-8044-2957-0')).toBeFalse();
  });

  it('rejects a wrong check digit, a wrong length and foreign characters', () => {
    expect(isValidIsbn10('0-8436-1072-8')).toBeFalse();
    expect(isValidIsbn10('0-8436-1072')).toBeFalse();
    expect(isValidIsbn10('0.8436.1072.7')).toBeFalse();
    expect(isValidIsbn10('978-0-8436-1072-7')).toBeFalse();
  });

  it('agrees with isbn3 (npm reference) wherever isbn3 knows the range', () => {
    expectProperty(
      fc.property(validIsbn10, (isbn) => {
        // isbn3 also checks the range is assigned, so it may say null for a valid check digit.
        const reference = parse(isbn);
        return isValidIsbn10(isbn) && (reference === null || reference.isbn10 === isbn);
      }),
      { numRuns: 300 },
    );
  });

  it('rejects every single-digit corruption, as isbn3 does (ISO 2108: mod 11 catches them all)', () => {
    expectProperty(
      fc.property(validIsbn10, fc.nat({ max: 8 }), fc.integer({ min: 1, max: 9 }), (isbn, at, shift) => {
        const corrupted = withDigitShifted(isbn, at, shift);
        return !isValidIsbn10(corrupted) && parse(corrupted) === null;
      }),
      { numRuns: 300 },
    );
  });

  it('rejects every swap of two unequal adjacent digits (mod 11 catches transpositions)', () => {
    // ISBN Users' Manual: the ISBN-10 modulus 11 check detects transposed adjacent digits.
    expectProperty(
      fc.property(validIsbn10, fc.nat({ max: 7 }), (isbn, at) => {
        fc.pre(isbn[at] !== isbn[at + 1]);
        const swapped = isbn.slice(0, at) + isbn[at + 1] + isbn[at] + isbn.slice(at + 2);
        return !isValidIsbn10(swapped) && parse(swapped) === null;
      }),
      { numRuns: 300 },
    );
  });
});
