import fc from 'fast-check';
import { parse } from 'isbn3';
import { isbn10CheckDigit } from './isbn10-check-digit';
import { expectProperty } from '../testing/expect-property';

describe('isbn10CheckDigit', () => {
  it("matches the ISBN Users' Manual worked example 0-8436-1072-7", () => {
    // ISBN Users' Manual (International ISBN Agency), ISBN-10 check digit example, by hand:
    // 0×10 + 8×9 + 4×8 + 3×7 + 6×6 + 1×5 + 0×4 + 7×3 + 2×2 = 191; 191 mod 11 = 4; 11 − 4 = 7.
    expect(isbn10CheckDigit('084361072')).toBe('7');
  });

  it('gives the check digit of the Wikipedia ISBN example 0-306-40615-2 (from memory)', () => {
    // Wikipedia "ISBN", ISBN-10 check digit calculation (from memory): sum 130, 130 mod 11 = 9, 11 − 9 = 2.
    expect(isbn10CheckDigit('030640615')).toBe('2');
  });

  it("writes 10 as 'X' (ISO 2108)", () => {
    // 0-8044-2957-X, an ISBN-10 ending in X (from memory); isbn3, the npm reference, accepts it:
    // 0×10 + 8×9 + 0×8 + 4×7 + 4×6 + 2×5 + 9×4 + 5×3 + 7×2 = 199; 199 mod 11 = 1; 11 − 1 = 10 → X.
    expect(parse('0-8044-2957-X')).not.toBeNull();
    expect(isbn10CheckDigit('080442957')).toBe('X');
  });

  it('agrees with isbn3 (npm reference) on random bodies', () => {
    // isbn3 only parses ISBNs in assigned ranges, so the property holds for bodies where exactly
    // one of the 11 check characters parses; that one must be ours.
    expectProperty(
      fc.property(fc.stringMatching(/^\d{9}$/), (body) => {
        const accepted = [...'0123456789X'].filter((c) => parse(body + c) !== null);
        fc.pre(accepted.length > 0);
        return accepted.length === 1 && accepted[0] === isbn10CheckDigit(body);
      }),
      { numRuns: 200 },
    );
  });

  it('refuses a body that is not 9 digits', () => {
    expect(isbn10CheckDigit('08436107')).toBeNull();
    expect(isbn10CheckDigit('08436107X')).toBeNull();
  });
});
