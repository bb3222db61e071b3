import { alphabetKey } from './alphabet-key';

// Titles and names here are invented for the tests.
describe('alphabetKey', () => {
  describe('by title', () => {
    it('drops a leading "The", "A" or "An"', () => {
      // Common practice in library filing: initial articles are disregarded (ALA Filing Rules,
      // 1980; MARC 21 Bibliographic, field 245 second indicator "nonfiling characters", e.g. 4
      // for "The " — both from memory).
      expect(alphabetKey('The Quiet Orchard', 'title')).toBe('Q');
      expect(alphabetKey('A Chart of Brine', 'title')).toBe('C');
      expect(alphabetKey('An Owl at Dusk', 'title')).toBe('O');
      expect(alphabetKey('the lantern keepers', 'title')).toBe('L');
    });

    it('keeps words that only begin like an article', () => {
      // Same rule: only the article as a whole word is nonfiling.
      expect(alphabetKey("Theodora's Lamp", 'title')).toBe('T');
      expect(alphabetKey('Anselm Crossing', 'title')).toBe('A');
      expect(alphabetKey('Atlas of Small Hours', 'title')).toBe('A');
      expect(alphabetKey('A.I. Lullabies', 'title')).toBe('A');
    });

    it('looks past leading punctuation', () => {
      // ALA Filing Rules (1980, from memory): punctuation is disregarded in filing.
      expect(alphabetKey('"The Quiet Orchard"', 'title')).toBe('Q');
      expect(alphabetKey('…and Then the Rain', 'title')).toBe('A');
      expect(alphabetKey('¿Dónde Duermen las Garzas?', 'title')).toBe('D');
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
      expect(alphabetKey('Émile and the Tidewater Clock', 'title')).toBe('E');
      expect(alphabetKey('Ísafold Winter', 'title')).toBe('I');
      expect(alphabetKey('Çelik Bridges', 'title')).toBe('C');
      expect(alphabetKey('ñandú tales', 'title')).toBe('N');
      expect(alphabetKey('E\u0301mile Again', 'title')).toBe('E');
    });

    it('gives null for letters NFD does not split (a documented limit)', () => {
      // UnicodeData.txt: U+00D8 Ø and U+0141 Ł have no decomposition mapping.
      expect(alphabetKey('Østerby Lights', 'title')).toBeNull();
      expect(alphabetKey('Tomasz Łęcki', 'author-surname')).toBeNull();
    });
  });

  it('gives null when the first character is no Latin letter', () => {
    // Our rule: digits and other scripts have no place in an A–Z challenge.
    expect(alphabetKey('1947 Lanterns', 'title')).toBeNull();
    expect(alphabetKey('Ωmega Tide', 'title')).toBeNull();
    expect(alphabetKey('月の庭', 'title')).toBeNull();
    expect(alphabetKey('', 'title')).toBeNull();
    expect(alphabetKey('   ', 'author-surname')).toBeNull();
  });

  describe('by author surname', () => {
    it('uses the last word of the name', () => {
      // Our rule (documented): Western name order, surname last.
      expect(alphabetKey('Ada Okafor', 'author-surname')).toBe('O');
      expect(alphabetKey('  Bea   Hartwell ', 'author-surname')).toBe('H');
      expect(alphabetKey('Marisol Ávila', 'author-surname')).toBe('A');
      expect(alphabetKey('Quillon', 'author-surname')).toBe('Q');
    });

    it('does not look past particles (a documented limit)', () => {
      // Cataloguing rules differ by language on particles (e.g. AACR2 22.5D, from memory); we
      // file under the last word whatever the particle.
      expect(alphabetKey('Ines van der Berg', 'author-surname')).toBe('B');
    });
  });
});
