import { alphabetKey } from './alphabet-key';

/** The key of each text, compared all at once so a failure names every text that went wrong. */
function expectKeys(by: 'title' | 'author-surname', cases: readonly (readonly [text: string, key: string | null])[]): void {
  expect(cases.map(([text]) => alphabetKey(text, by))).toEqual(cases.map(([, key]) => key));
}

// Titles and names here are invented for the tests.
describe('alphabetKey', () => {
  describe('by title', () => {
    it('drops a leading "The", "A" or "An"', () => {
      // Common practice in library filing: initial articles are disregarded (ALA Filing Rules,
      // 1980; MARC 21 Bibliographic, field 245 second indicator "nonfiling characters", e.g. 4
      // for "The " — both from memory).
      expectKeys('title', [
        ['The Quiet Orchard', 'Q'],
        ['A Chart of Brine', 'C'],
        ['An Owl at Dusk', 'O'],
        ['the lantern keepers', 'L'],
      ]);
    });

    it('keeps words that only begin like an article', () => {
      // Same rule: only the article as a whole word is nonfiling.
      expectKeys('title', [
        ["Theodora's Lamp", 'T'],
        ['Anselm Crossing', 'A'],
        ['Atlas of Small Hours', 'A'],
        ['A.I. Lullabies', 'A'],
      ]);
    });

    it('looks past leading punctuation', () => {
      // ALA Filing Rules (1980, from memory): punctuation is disregarded in filing.
      expectKeys('title', [
        ['"The Quiet Orchard"', 'Q'],
        ['…and Then the Rain', 'A'],
        ['¿Dónde Duermen las Garzas?', 'D'],
      ]);
    });

    it('keeps articles of other languages (a documented limit)', () => {
      // Our rule handles English articles only.
      expect(alphabetKey('La Casa de los Vientos', 'title')).toBe('L');
    });
  });

  describe('folding diacritics', () => {
    it('files an accented capital under its base letter', () => {
      // Unicode Character Database (UnicodeData.txt): U+00C9 É decomposes canonically to
      // U+0045 E + U+0301; likewise Í → I + U+0301, Ç → C + U+0327, Ñ → N + U+0303 (UAX #15, NFD).
      expectKeys('title', [
        ['Émile and the Tidewater Clock', 'E'],
        ['Ísafold Winter', 'I'],
        ['Çelik Bridges', 'C'],
        ['ñandú tales', 'N'],
        ['E\u0301mile Again', 'E'],
      ]);
    });

    it('gives null for letters NFD does not split (a documented limit)', () => {
      // UnicodeData.txt: U+00D8 Ø and U+0141 Ł have no decomposition mapping.
      expect(alphabetKey('Østerby Lights', 'title')).toBeNull();
      expect(alphabetKey('Tomasz Łęcki', 'author-surname')).toBeNull();
    });
  });

  it('gives null when the first character is no Latin letter', () => {
    // Our rule: digits and other scripts have no place in an A–Z challenge.
    expectKeys('title', [
      ['1947 Lanterns', null],
      ['Ωmega Tide', null],
      ['月の庭', null],
      ['', null],
    ]);
    expect(alphabetKey('   ', 'author-surname')).toBeNull();
  });

  describe('by author surname', () => {
    it('uses the last word of the name', () => {
      // Our rule (documented): Western name order, surname last.
      expectKeys('author-surname', [
        ['Ada Okafor', 'O'],
        ['  Bea   Hartwell ', 'H'],
        ['Marisol Ávila', 'A'],
        ['Quillon', 'Q'],
      ]);
    });

    it('does not look past particles (a documented limit)', () => {
      // Cataloguing rules differ by language on particles (e.g. AACR2 22.5D, from memory); we
      // file under the last word whatever the particle.
      expect(alphabetKey('Ines van der Berg', 'author-surname')).toBe('B');
    });
  });
});
