import type { Book, Quote } from '@shared/sync/schema/collections';

import { queryQuotes, quoteSearchText } from './quote-query';

describe('quote search', () => {
  const books: Book[] = [
    { id: 'b1', title: 'Les Étés de Noirmoutier', authors: ['Hélène Duclos'], format: 'print' },
    { id: 'b2', title: 'The Fen Hours', authors: ['Ines Roa'], format: 'audiobook' },
  ];
  const quotes: Quote[] = [
    { id: 'q1', bookId: 'b1', text: 'La mer monte sans bruit.', capturedAt: '2026-03-01T08:00:00.000Z', labelIds: ['calm'] },
    {
      id: 'q2',
      bookId: 'b2',
      text: 'Reeds keep the time.',
      note: 'Read aloud at the book club',
      capturedAt: '2026-03-05T08:00:00.000Z',
      favourite: true,
      labelIds: ['calm', 'club'],
    },
    { id: 'q3', bookId: 'b2', text: 'Nothing hurries here.', chapter: 'Low Water', tags: ['slow'], capturedAt: '2026-03-03T08:00:00.000Z' },
    { id: 'q4', text: 'Half-synced, no time yet.' },
  ];
  const byId = new Map(books.map((book) => [book.id, book]));
  const index = new Map(quotes.map((quote) => [quote.id, quoteSearchText(quote, quote.bookId ? byId.get(quote.bookId) : undefined)]));
  const ids = (query: Partial<Parameters<typeof queryQuotes>[2]>) =>
    queryQuotes(quotes, index, { text: '', labelIds: [], favouritesOnly: false, ...query }).map((quote) => quote.id);

  it('shows every quote newest first, those without a capture time last', () => {
    expect(ids({})).toEqual(['q2', 'q3', 'q1', 'q4']);
  });

  it('finds by text, note, chapter, tag and the book’s title or author, folding case and accents', () => {
    expect(ids({ text: 'MER' })).toEqual(['q1']);
    expect(ids({ text: 'helene' })).toEqual(['q1']); // the author, typed without accents
    expect(ids({ text: 'etes noirmoutier' })).toEqual(['q1']);
    expect(ids({ text: 'book club' })).toEqual(['q2']);
    expect(ids({ text: 'low water' })).toEqual(['q3']);
    expect(ids({ text: 'slow' })).toEqual(['q3']);
    expect(ids({ text: 'fen' })).toEqual(['q2', 'q3']);
    expect(ids({ text: 'fen mer' })).toEqual([]);
  });

  it('narrows to favourites and to quotes carrying every chosen label', () => {
    expect(ids({ favouritesOnly: true })).toEqual(['q2']);
    expect(ids({ labelIds: ['calm'] })).toEqual(['q2', 'q1']);
    expect(ids({ labelIds: ['calm', 'club'] })).toEqual(['q2']);
    expect(ids({ labelIds: ['calm'], text: 'mer' })).toEqual(['q1']);
  });
});
