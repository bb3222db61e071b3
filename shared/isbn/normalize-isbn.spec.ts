import fc from 'fast-check';
import { asIsbn13 } from 'isbn3';
import { normalizeIsbn } from './normalize-isbn';
import { expectProperty } from '../testing/expect-property';
import { WORKED_ISBNS } from './testing/worked-examples';

describe('normalizeIsbn', () => {
  for (const example of WORKED_ISBNS) {
    it(`gives the same key for both forms of ${example.hyphenated10}, ${example.source}`, () => {
      expect(normalizeIsbn(example.hyphenated10)).toBe(example.isbn13);
      expect(normalizeIsbn(example.isbn13)).toBe(example.isbn13);
    });
  }

  it("keeps a valid ISBN-13 (ISBN Users' Manual example 978-92-95055-12-4) as digits", () => {
    expect(normalizeIsbn(' 978 92 95055 12 4 ')).toBe('9789295055124');
  });

  it('answers null for anything that is not a valid ISBN', () => {
    expect(normalizeIsbn('978-92-95055-12-5')).toBeNull();
    expect(normalizeIsbn('0-8436-1072-8')).toBeNull();
    expect(normalizeIsbn('6291041500213')).toBeNull();
    expect(normalizeIsbn('')).toBeNull();
    expect(normalizeIsbn('not an isbn')).toBeNull();
  });

  it('agrees with isbn3 asIsbn13 (npm reference) whenever isbn3 recognises the input', () => {
    const digitsOrX = fc.stringMatching(/^(\d{9}[\dX]|97[89]\d{10})$/);
    expectProperty(
      fc.property(digitsOrX, (input) => {
        const reference = asIsbn13(input);
        const ours = normalizeIsbn(input);
        // isbn3 also rejects unassigned ranges, so only its "valid" answers bind us.
        if (reference !== null) return ours === reference;
        return ours === null || /^97[89]\d{10}$/.test(ours);
      }),
      { numRuns: 500 },
    );
  });
});
