import fc from 'fast-check';
import { asIsbn10 } from 'isbn3';

import { expectProperty } from '../testing/expect-property';
import { isbn13To10 } from './isbn13-to-10';
import { standardEan13CheckDigit, standardIsbn10CheckDigit } from './testing/standard-check-digits';
import { WORKED_ISBNS } from './testing/worked-examples';

describe('isbn13To10', () => {
  for (const example of WORKED_ISBNS) {
    it(`turns ${example.isbn13} back into ${example.hyphenated10}, ${example.source}`, () => {
      // ISBN Users' Manual: an ISBN-13 with prefix 978 has the ISBN-10 of its nine middle digits (X where modulus 11 asks for 10).
      expect(isbn13To10(example.isbn13)).toBe(example.isbn10);
    });
  }

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
