import { readingGenre } from './reading-genre';

describe('readingGenre', () => {
  it('reads fiction and non-fiction from the genres readers write (our own word list)', () => {
    expect(readingGenre(['Fantasy'])).toBe('fiction');
    expect(readingGenre(['Science fiction']))
      .withContext('"science" alone would say non-fiction')
      .toBe('fiction');
    expect(readingGenre(['Historical fiction'])).toBe('fiction');
    expect(readingGenre(['Non-fiction'])).toBe('nonfiction');
    expect(readingGenre(['nonfiction'])).toBe('nonfiction');
    expect(readingGenre(['True crime']))
      .withContext('"crime" alone would say fiction')
      .toBe('nonfiction');
    expect(readingGenre(['Memoir', 'Humour'])).toBe('nonfiction');
  });

  it('lets the first genre that tells decide, and says nothing when none does', () => {
    expect(readingGenre(['Poetry', 'Essays', 'Novels'])).toBe('nonfiction');
    expect(readingGenre(['Sea stories', 'Mystery', 'History'])).toBe('fiction');
    expect(readingGenre(['Poetry'])).toBeUndefined();
    expect(readingGenre([])).toBeUndefined();
    expect(readingGenre(null)).toBeUndefined();
    // Whole words only: "Fictional maps" is not a genre of fiction, "Sciences" not science.
    expect(readingGenre(['Fictional maps'])).toBeUndefined();
  });
});
