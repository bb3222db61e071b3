import fc from 'fast-check';
import { parse } from 'isbn3';
import { isbn10CheckDigit } from './isbn10-check-digit';
import { expectProperty } from '../testing/expect-property';
import { WORKED_ISBNS } from './testing/worked-examples';

describe('isbn10CheckDigit', () => {
  for (const example of WORKED_ISBNS) {
    it(`gives ${example.hyphenated10}'s check character, as in ${example.source}`, () => {
      expect(parse(example.hyphenated10)).not.toBeNull();
      expect(isbn10CheckDigit(example.isbn10.slice(0, 9))).toBe(example.isbn10.slice(9));
    });
  }

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
