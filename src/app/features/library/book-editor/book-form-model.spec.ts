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
    expect(toFields({ ...EMPTY_BOOK_FORM, title: ' A Lantern for Ada ', authors: 'Ivo Brandt,  Selma Rook ,', pageCount: ' ' })).toEqual({
      title: 'A Lantern for Ada',
      authors: ['Ivo Brandt', 'Selma Rook'],
      format: 'print',
      status: 'tbr',
      rating: null,
      pageCount: null,
      isbn: null,
      coverId: null,
    });
  });

  it('stores an ISBN-10 as its ISBN-13 digits (ISBN Users’ Manual: 0-8436-1072-7 → 978-0-8436-1072-7)', () => {
    expect(toFields({ ...EMPTY_BOOK_FORM, isbn: '0-8436-1072-7' }).isbn).toBe('9780843610727');
  });
});
