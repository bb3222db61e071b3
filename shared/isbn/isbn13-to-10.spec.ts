import fc from 'fast-check';
import { asIsbn10 } from 'isbn3';

import { expectProperty } from '../testing/expect-property';
import { isbn13To10 } from './isbn13-to-10';
import { standardEan13CheckDigit, standardIsbn10CheckDigit } from './testing/standard-check-digits';

describe('isbn13To10', () => {
  it("turns the ISBN Users' Manual example 978-0-8436-1072-7 back into 0-8436-1072-7", () => {
    // ISBN Users' Manual: an ISBN-13 with prefix 978 has the ISBN-10 of its nine middle digits.
    expect(isbn13To10('9780843610727')).toBe('0843610727');
  });

  it('gives an X check character where modulus 11 asks for 10 (0-8044-2957-X)', () => {
    expect(isbn13To10('9780804429573')).toBe('080442957X');
  });

  it('answers null for 979 ISBNs, which have no ISBN-10 (ISO 2108; 979-10-343-0443-1 is valid by isbn3)', () => {
    expect(isbn13To10('9791034304431')).toBeNull();
  });

  it('agrees with isbn3 asIsbn10 (npm reference) on ISBNs of the English-language group 0', () => {
    // Group 0's publisher ranges cover every number (the ISBN International range message, from
    // memory), so isbn3 knows them all; unassigned groups are null in isbn3 but not in ISO 2108.
    // Both check digits come from the standard's formulas written in the spec, not from ours.
    expectProperty(
      fc.property(fc.stringMatching(/^\d{8}$/), (rest) => {
        const body = `0${rest}`;
        const isbn10 = body + standardIsbn10CheckDigit(body);
        const isbn13 = `978${body}${standardEan13CheckDigit(`978${body}`)}`;
        return isbn13To10(isbn13) === isbn10 && asIsbn10(isbn13) === isbn10;
      }),
      { numRuns: 200 },
    );
  });
});
