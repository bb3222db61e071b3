import fc from 'fast-check';
import { asIsbn13 } from 'isbn3';
import { isbn10To13 } from './isbn10-to-13';
import { standardIsbn10CheckDigit } from './testing/standard-check-digits';
import { expectProperty } from '../testing/expect-property';
import { WORKED_ISBNS } from './testing/worked-examples';

describe('isbn10To13', () => {
  for (const example of WORKED_ISBNS) {
    it(`converts ${example.hyphenated10}, ${example.source}, to 978 + its nine digits + a recomputed check digit`, () => {
      // ISBN Users' Manual: ISBN-13 = 978 + first nine digits + recalculated check digit; isbn3 (npm reference) agrees.
      expect(isbn10To13(example.hyphenated10)).toBe(example.isbn13);
      expect(isbn10To13(example.hyphenated10)).toBe(asIsbn13(example.hyphenated10));
    });
  }

  it('agrees with isbn3 asIsbn13 (npm reference) for random valid ISBN-10s', () => {
    expectProperty(
      fc.property(fc.stringMatching(/^\d{9}$/), (body) => {
        const isbn10 = body + standardIsbn10CheckDigit(body);
        const reference = asIsbn13(isbn10);
        fc.pre(reference !== null);
        return isbn10To13(isbn10) === reference;
      }),
      { numRuns: 200 },
    );
  });

  it('answers null for an invalid ISBN-10', () => {
    expect(isbn10To13('0-8436-1072-8')).toBeNull();
    expect(isbn10To13('978-0-8436-1072-7')).toBeNull();
  });
});
