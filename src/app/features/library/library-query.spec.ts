import type { Book } from '@shared/sync/schema/collections';

import { duplicateBookCount, LibraryRows, LibrarySorter, queryLibrary, searchText, type LibraryQuery } from './library-query';

const COMFORT = '00000000-0000-4000-8000-00000000c001';
const BUDDY = '00000000-0000-4000-8000-00000000c002';
const book = (id: string, fields: Partial<Book>): Book => ({ id, deleted: false, ...fields });
const shelf = [
  book('a', { title: 'Émile and the Salt Roads', authors: ['Priya Lindqvist'], status: 'reading', rating: 4, isbn: '9789295055124' }),
  book('b', { title: 'A Harbour of Small Hours', authors: ['Tobias Avery'], status: 'finished', rating: 5, tags: ['winter'], labelIds: [COMFORT, BUDDY] }),
  book('c', { title: 'The Copper Orchard', authors: ['Mina Achebe-Ross'], status: 'tbr', labelIds: [] }),
  book('d', { title: 'copper kettles', authors: ['Ana Zorrilla'], status: 'finished', rating: 2.5, labelIds: [BUDDY] }),
];
const query = (overrides: Partial<LibraryQuery>, books: readonly Book[] = shelf): string[] =>
  queryLibrary(books, new Map(books.map((b) => [b.id, searchText(b)])), { text: '', status: 'all', sort: { by: 'title', direction: 'asc' }, ...overrides }).map(
    (b) => b.id,
  );

describe('queryLibrary', () => {
  it('finds books by any words of the title or author, ignoring case and accents', () => {
    expect(query({ text: 'copper' })).toEqual(['d', 'c']); // by title: "copper kettles" before "The Copper Orchard"
    expect(query({ text: 'emile salt' })).toEqual(['a']);
    expect(query({ text: 'AVERY harbour' })).toEqual(['b']);
    expect(query({ text: 'winter' })).toEqual(['b']);
    expect(query({ text: 'nothing like this' })).toEqual([]);
  });

  it('finds a book by its ISBN typed with hyphens (ISBN Users’ Manual form 978-92-95055-12-4)', () => {
    expect(query({ text: '978-92-95055-12-4' })).toEqual(['a']);
  });

  it('filters by status', () => {
    expect(query({ status: 'finished' })).toEqual(['b', 'd']);
  });

  it('filters by a label, together with the status and the words typed', () => {
    expect(query({ labelId: BUDDY })).toEqual(['b', 'd']);
    expect(query({ labelId: COMFORT })).toEqual(['b']);
    expect(query({ labelId: BUDDY, text: 'kettles' })).toEqual(['d']);
    expect(query({ labelId: COMFORT, status: 'tbr' })).toEqual([]);
    expect(query({ labelId: '00000000-0000-4000-8000-00000000c0ff' })).toEqual([]); // a label no book has
    expect(query({ labelId: null })).toEqual(['b', 'd', 'a', 'c']); // any label, or none
  });

  it('sorts titles in a human way (Intl.Collator, base sensitivity) and authors by surname', () => {
    expect(query({})).toEqual(['b', 'd', 'a', 'c']); // "A Harbour", "copper kettles", "Émile", "The Copper"
    expect(query({ sort: { by: 'authors', direction: 'asc' } })).toEqual(['c', 'b', 'a', 'd']); // Achebe-Ross, Avery, Lindqvist, Zorrilla
  });

  it('puts unrated books last whichever way ratings are sorted', () => {
    expect(query({ sort: { by: 'rating', direction: 'desc' } })).toEqual(['b', 'a', 'd', 'c']);
    expect(query({ sort: { by: 'rating', direction: 'asc' } })).toEqual(['d', 'a', 'b', 'c']);
  });
});

describe('LibraryRows and LibrarySorter', () => {
  it('keeps the row of a book that did not change, and works out again only the changed one', () => {
    const rows = new LibraryRows();
    const first = rows.update(shelf);
    const copies = shelf.map((b) => ({ ...b, authors: b.authors && [...b.authors] })); // fresh objects, as IndexedDB gives
    copies[1] = { ...copies[1]!, status: 'reading' };

    const second = rows.update(copies);

    expect(second[0]).toBe(first[0]!);
    expect(second[1]).not.toBe(first[1]!);
    expect(second[1]!.book.status).toBe('reading');
    expect(rows.update(copies.slice(2)).map((row) => row.book.id)).toEqual(['c', 'd']); // removed books leave
  });

  it('sorts from its last order to the same result a fresh sort gives (as queryLibrary)', () => {
    const sorter = new LibrarySorter();
    const rows = new LibraryRows();
    const sort = { by: 'title', direction: 'asc' } as const;
    expect(sorter.sort(rows.update(shelf), sort).map((row) => row.book.id)).toEqual(['b', 'd', 'a', 'c']);
    const renamed = [...shelf.slice(0, 3), { ...shelf[3]!, title: 'Zinc kettles' }, book('e', { title: 'Amber' })];

    expect(sorter.sort(rows.update(renamed), sort).map((row) => row.book.id)).toEqual(query({}, renamed));
    expect(query({}, renamed)).toEqual(['b', 'e', 'a', 'c', 'd']); // "A Harbour" before "Amber": a space sorts before letters
  });
});

describe('duplicateBookCount', () => {
  it('counts every book that shares an ISBN-13 or a normalised title and first author with another', () => {
    const rows = new LibraryRows();
    expect(duplicateBookCount(rows.update(shelf))).toBe(0);
    const twice = [
      ...shelf,
      book('e', { title: 'The Copper Orchard', authors: ['Achebe-Ross, Mina'], status: 'tbr' }), // c again, "Surname, Given"
      book('f', { title: 'Salt Roads (second copy)', authors: ['Someone Else'], isbn: '9789295055124' }), // a's ISBN
    ];
    expect(duplicateBookCount(rows.update(twice))).toBe(4);
  });
});
