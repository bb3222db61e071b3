import { topTerms } from './top-terms';

describe('topTerms', () => {
  it('ranks terms by books, one term whatever the case or spaces, ties alphabetically (worked by hand)', () => {
    const lists = [['Sea stories', 'Fantasy'], ['fantasy ', 'Poetry'], ['Fantasy', 'fantasy'], ['sea stories'], ['Essays'], null];
    // Fantasy: books 1, 2, 3 (book 3 once) = 3; Sea stories: books 1, 4 = 2; Essays, Poetry: 1 each.
    expect(topTerms(lists, 3)).toEqual({
      top: [
        { term: 'Fantasy', count: 3 },
        { term: 'Sea stories', count: 2 },
        { term: 'Essays', count: 1 },
      ],
      otherTerms: 1,
    });
  });

  it('gives nothing for books without terms and refuses a limit below 1', () => {
    expect(topTerms([[], [' '], undefined], 5)).toEqual({ top: [], otherTerms: 0 });
    expect(() => topTerms([], 0)).toThrowError(RangeError);
  });
});
