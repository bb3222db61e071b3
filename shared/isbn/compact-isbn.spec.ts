import { compactIsbn } from './compact-isbn';

describe('compactIsbn', () => {
  it('drops the hyphens and spaces of the printed forms', () => {
    // Hyphenated form as printed in the ISBN Users' Manual (International edition) example.
    expect(compactIsbn('978-92-95055-12-4')).toBe('9789295055124');
    expect(compactIsbn(' 0 8436 1072 7 ')).toBe('0843610727');
  });

  it("upper-cases an 'x' check character and keeps other characters so they stay invalid", () => {
    // ISO 2108: the ISBN-10 check character 10 is written as the Roman numeral X.
    expect(compactIsbn('0-8044-2957-x')).toBe('080442957X');
    expect(compactIsbn('ISBN 0-8044')).toBe('ISBN08044');
  });
});
