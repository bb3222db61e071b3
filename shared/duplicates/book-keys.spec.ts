import { bookKeys, findDuplicates, normaliseAuthor, normaliseTitle } from './book-keys';

describe('book keys', () => {
  it('normalises titles and authors (Unicode NFKD, accents, case, punctuation, leading article, inverted names)', () => {
    expect(normaliseTitle('The Café at Dusk: A Novel')).toBe('cafe at dusk a novel');
    expect(normaliseTitle('  cafe AT dusk — a novel ')).toBe('cafe at dusk a novel');
    expect(normaliseAuthor('Ferrant, Odile')).toBe('odile ferrant');
    expect(normaliseAuthor('Odile Ferránt')).toBe('odile ferrant');
  });

  it('keys a book by ISBN-13 and by title with first author', () => {
    expect(bookKeys({ title: 'Salt Roads', authors: ['Mirela Oakes', 'X'], isbn: '9780306406157' })).toEqual([
      'isbn:9780306406157',
      'title:salt roads|mirela oakes',
    ]);
    expect(bookKeys({ title: '', authors: [] })).toEqual([]);
  });

  it('groups books sharing an ISBN or a title and first author, transitively', () => {
    const books = [
      { id: 'a', title: 'Salt Roads', authors: ['Mirela Oakes'], isbn: '9780306406157' },
      { id: 'b', title: 'Salt roads', authors: ['Oakes, Mirela'] },
      { id: 'c', title: 'Another Book', authors: ['Someone'], isbn: '9780306406157' },
      { id: 'd', title: 'Salt Roads', authors: ['Different Author'] },
    ];
    expect(findDuplicates(books).map((group) => group.map((book) => book.id))).toEqual([['a', 'b', 'c']]);
  });
});
