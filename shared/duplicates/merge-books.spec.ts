import { differingFields, mergeBooks } from './merge-books';

const kept = { id: 'kept', title: 'Salt Roads', authors: ['Mirela Oakes'], isbn: null, pageCount: 300, rating: 4 };
const other = { id: 'other', title: 'Salt roads', authors: ['Mirela Oakes'], isbn: '9780306406157', pageCount: 300, rating: 5 };

describe('mergeBooks', () => {
  it('asks only about fields that differ', () => {
    expect(differingFields(kept, other)).toEqual(['title', 'isbn', 'rating']);
  });

  it('takes the picked values, moves every child to the kept book and makes the other a tombstone', () => {
    const writes = mergeBooks(kept, other, { isbn: 'other', title: 'kept', rating: 'other' }, [
      { collection: 'sessions', id: 's1' },
      { collection: 'readings', id: 'r1' },
      { collection: 'quotes', id: 'q1' },
    ]);
    expect(writes).toEqual([
      { collection: 'books', rowId: 'kept', patch: { isbn: '9780306406157', rating: 5 } },
      { collection: 'sessions', rowId: 's1', patch: { bookId: 'kept' } },
      { collection: 'readings', rowId: 'r1', patch: { bookId: 'kept' } },
      { collection: 'quotes', rowId: 'q1', patch: { bookId: 'kept' } },
      { collection: 'books', rowId: 'other', patch: { deleted: true } },
    ]);
  });

  it('writes nothing to the kept book when every pick is its own', () => {
    expect(mergeBooks(kept, other, {}, [])).toEqual([{ collection: 'books', rowId: 'other', patch: { deleted: true } }]);
  });
});
