import { referenceMoves } from './book-references';
import { differingFields, mergeBooks } from './merge-books';

const KEPT = '00000000-0000-4000-8000-00000000a001';
const OTHER = '00000000-0000-4000-8000-00000000a002';
const SERIES = '00000000-0000-4000-8000-00000000a003';
const kept = { id: KEPT, title: 'Salt Roads', authors: ['Mirela Oakes'], isbn: null, pageCount: 300, rating: 4 };
const other = { id: OTHER, title: 'Salt roads', authors: ['Mirela Oakes'], isbn: '9780306406157', pageCount: 300, rating: 5, seriesId: SERIES, seriesPosition: 2 };

describe('mergeBooks', () => {
  it('asks only about fields that differ, series membership included', () => {
    expect(differingFields(kept, other)).toEqual(['title', 'isbn', 'rating', 'seriesId', 'seriesPosition']);
  });

  it('takes the picked values, moves every reference to the kept book and makes the other a tombstone', () => {
    const moves = referenceMoves(
      {
        sessions: [{ id: 's1', bookId: OTHER }],
        readings: [{ id: 'r1', bookId: OTHER }],
        quotes: [{ id: 'q1', bookId: KEPT }],
        loans: [{ id: 'l1', bookId: OTHER }],
        circleProgress: [{ id: 'c1', circleId: 'x', bookLinks: { p: OTHER } }],
      },
      OTHER,
      KEPT,
    );
    const writes = mergeBooks(kept, other, { isbn: 'other', title: 'kept', rating: 'other', seriesId: 'other', seriesPosition: 'other' }, moves);
    expect(writes).toEqual([
      { collection: 'books', rowId: KEPT, patch: { isbn: '9780306406157', rating: 5, seriesId: SERIES, seriesPosition: 2 } },
      { collection: 'readings', rowId: 'r1', patch: { bookId: KEPT } },
      { collection: 'sessions', rowId: 's1', patch: { bookId: KEPT } },
      { collection: 'loans', rowId: 'l1', patch: { bookId: KEPT } },
      { collection: 'books', rowId: OTHER, patch: { deleted: true } },
    ]);
  });

  it('writes nothing to the kept book when every pick is its own', () => {
    expect(mergeBooks(kept, other, {}, [])).toEqual([{ collection: 'books', rowId: OTHER, patch: { deleted: true } }]);
  });
});
