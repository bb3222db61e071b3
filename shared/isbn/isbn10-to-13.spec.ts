import fc from 'fast-check';
import { asIsbn13 } from 'isbn3';
import { isbn10To13 } from './isbn10-to-13';
import { standardIsbn10CheckDigit } from './testing/standard-check-digits';
import { expectProperty } from '../testing/expect-property';

describe('isbn10To13', () => {
  it("converts the ISBN Users' Manual example 0-8436-1072-7 to 978-0-8436-1072-7", () => {
    // ISBN Users' Manual: ISBN-13 = 978 + first nine digits + recalculated check digit.
    expect(isbn10To13('0-8436-1072-7')).toBe('9780843610727');
  });

  it('converts the Wikipedia example 0-306-40615-2 to 978-0-306-40615-7 (from memory)', () => {
    expect(isbn10To13('0-306-40615-2')).toBe('9780306406157');
  });

  it("recomputes the check digit instead of keeping an 'X'", () => {
    // isbn3 (npm reference) maps 0-8044-2957-X to its ISBN-13.
    expect(isbn10To13('0-8044-2957-X')).toBe(asIsbn13('0-8044-2957-X'));
    expect(isbn10To13('0-8044-2957-X')).toBe('9780804429573');
  });

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
