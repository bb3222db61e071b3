import { changedFields, EMPTY_BOOK_FORM, toFields, toFormValue } from './book-form-model';

describe('book form model', () => {
  const loaded = toFormValue({
    id: 'b1',
    title: 'The Tin Lighthouse',
    authors: ['Mara Quell', 'Jon Estrada'],
    format: 'print',
    status: 'reading',
    rating: 4,
    pageCount: 312,
    isbn: '9789295055124',
    coverId: 'ab'.repeat(32),
  });

  it('sends only the fields the reader changed, so edits from other devices are not overwritten', () => {
    expect(changedFields(loaded, { ...loaded, rating: '4.5' })).toEqual({ rating: 4.5 });
    expect(changedFields(loaded, { ...loaded })).toEqual({});
    expect(changedFields(loaded, { ...loaded, coverId: null })).toEqual({ coverId: null });
  });

  it('reads authors from a comma-separated line and blanks as null', () => {
    expect(
      toFields({ ...EMPTY_BOOK_FORM, title: ' A Lantern for Ada ', authors: 'Ivo Brandt,  Selma Rook ,Ivo Brandt', pageCount: ' ', genres: 'fable, ' }),
    ).toEqual({
      title: 'A Lantern for Ada',
      subtitle: null,
      authors: ['Ivo Brandt', 'Selma Rook'],
      format: 'print',
      pageCount: null,
      audioMinutes: null,
      status: 'tbr',
      copy: 'owned',
      rating: null,
      isbn: null,
      publisher: null,
      year: null,
      language: null,
      genres: ['fable'],
      tags: [],
      labelIds: [],
      seriesId: null,
      seriesPosition: null,
      dnfProgress: null,
      dnfUnit: null,
      dnfOn: null,
      dnfReason: null,
      wishPriority: null,
      wishWhere: null,
      wishPriceNote: null,
      releaseDate: null,
      preordered: false,
      coverId: null,
    });
  });

  it('stores an ISBN-10 as its ISBN-13 digits (ISBN Users’ Manual: 0-8436-1072-7 → 978-0-8436-1072-7)', () => {
    expect(toFields({ ...EMPTY_BOOK_FORM, isbn: '0-8436-1072-7' }).isbn).toBe('9780843610727');
  });

  it('reads a decimal comma as the fields allow it (a place of 2,5 in a series, a DNF at 42,5 %)', () => {
    const fields = toFields({ ...EMPTY_BOOK_FORM, seriesPosition: '2,5', dnfProgress: ' 42,5 ' });
    expect(fields.seriesPosition).toBe(2.5);
    expect(fields.dnfProgress).toBe(42.5);
  });
});
