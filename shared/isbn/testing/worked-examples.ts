/**
 * The same books as ISBN-10 and ISBN-13, each from a source outside the project, for the
 * check-digit and conversion specs. The ISBN-13s are 978 + the first nine digits + the GS1 check
 * digit (ISBN Users' Manual).
 */
export interface WorkedIsbn {
  /** Where the example comes from, and the check digit worked by hand. */
  readonly source: string;
  readonly hyphenated10: string;
  readonly isbn10: string;
  readonly isbn13: string;
}

export const WORKED_ISBNS: readonly WorkedIsbn[] = [
  {
    // 0×10 + 8×9 + 4×8 + 3×7 + 6×6 + 1×5 + 0×4 + 7×3 + 2×2 = 191; 191 mod 11 = 4; 11 − 4 = 7.
    source: "the ISBN Users' Manual (International ISBN Agency) worked example",
    hyphenated10: '0-8436-1072-7',
    isbn10: '0843610727',
    isbn13: '9780843610727',
  },
  {
    // Sum 130, 130 mod 11 = 9, 11 − 9 = 2.
    source: 'the Wikipedia "ISBN" example (from memory)',
    hyphenated10: '0-306-40615-2',
    isbn10: '0306406152',
    isbn13: '9780306406157',
  },
  {
    // 0×10 + 8×9 + 0×8 + 4×7 + 4×6 + 2×5 + 9×4 + 5×3 + 7×2 = 199; 199 mod 11 = 1; 11 − 1 = 10 → X (ISO 2108).
    source: 'an ISBN-10 ending in X (from memory; isbn3, the npm reference, accepts it)',
    hyphenated10: '0-8044-2957-X',
    isbn10: '080442957X',
    isbn13: '9780804429573',
  },
];
