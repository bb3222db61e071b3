import { fallbackPace } from './fallback-pace';

describe('fallbackPace', () => {
  it('uses Brysbaert (2019) silent reading rates: 238 wpm non-fiction, 260 fiction', () => {
    // Brysbaert 2019, J. Memory and Language 109, 104047, abstract: 238 and 260 words a minute.
    // Hand-worked at 275 words a page (common practice): 238 × 60 / 275 = 51.93 pages/hour,
    // 260 × 60 / 275 = 56.73 pages/hour.
    expect(fallbackPace({ format: 'print', genre: 'nonfiction' }).rate).toBeCloseTo(51.927, 3);
    expect(fallbackPace({ format: 'print', genre: 'fiction' }).rate).toBeCloseTo(56.727, 3);
  });

  it('takes the non-fiction rate when the genre is unknown', () => {
    // Brysbaert 2019 highlights: "For English silent reading it is 238 words per minute."
    expect(fallbackPace({ format: 'print' })).toEqual(fallbackPace({ format: 'print', genre: 'nonfiction' }));
  });

  it('follows the words per page across the usual 250–300 range (common practice)', () => {
    // 238 × 60 / 250 = 57.12 and 238 × 60 / 300 = 47.6 pages/hour.
    expect(fallbackPace({ format: 'print', wordsPerPage: 250 }).rate).toBeCloseTo(57.12, 6);
    expect(fallbackPace({ format: 'print', wordsPerPage: 300 }).rate).toBeCloseTo(47.6, 6);
  });

  it('gives ebooks percent per hour from the word count, the page count or the assumed length', () => {
    // 100,000 words of fiction at 260 wpm: 15,600 words an hour = 15.6 % an hour.
    expect(fallbackPace({ format: 'ebook', genre: 'fiction', wordCount: 100_000, pageCount: 1 }).rate).toBeCloseTo(15.6, 9);
    // 300 pages × 275 words = 82,500 words; 14,280 words an hour → 17.31 %/h.
    expect(fallbackPace({ format: 'ebook', pageCount: 300 }).rate).toBeCloseTo(17.309, 3);
    // Unknown size: the assumed 90,000-word book (common practice, from memory) → 15.87 %/h.
    // 238 × 60 / 90,000 × 100 = 15.867 %/h.
    expect(fallbackPace({ format: 'ebook' }).rate).toBeCloseTo(15.867, 3);
  });

  it('listens at the playback speed: 1 listened minute per real minute at 1×', () => {
    expect(fallbackPace({ format: 'audiobook' })).toEqual({ format: 'audiobook', rate: 1 });
    expect(fallbackPace({ format: 'audiobook', playbackSpeed: 1.5 })).toEqual({ format: 'audiobook', rate: 1.5 });
  });

  it('refuses sizes and speeds that are not positive', () => {
    expect(() => fallbackPace({ format: 'print', wordsPerPage: 0 })).toThrowError(RangeError);
    expect(() => fallbackPace({ format: 'ebook', pageCount: -5 })).toThrowError(RangeError);
    expect(() => fallbackPace({ format: 'audiobook', playbackSpeed: Number.NaN })).toThrowError(RangeError);
  });
});
