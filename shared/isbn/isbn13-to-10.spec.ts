import fc from 'fast-check';
import { asIsbn10 } from 'isbn3';
import { isbn10CheckDigit } from './isbn10-check-digit';
import { isbn10To13 } from './isbn10-to-13';
import { isbn13To10 } from './isbn13-to-10';

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

  it('agrees with isbn3 asIsbn10 (npm reference) and undoes isbn10To13', () => {
    fc.assert(
      fc.property(fc.stringMatching(/^\d{9}$/), (body) => {
        const isbn10 = body + isbn10CheckDigit(body);
        const isbn13 = isbn10To13(isbn10)!;
        return isbn13To10(isbn13) === asIsbn10(isbn13) && isbn13To10(isbn13) === isbn10;
      }),
      { numRuns: 200 },
    );
  });
});
