import { books } from './schema/collections';
import { validatePatch } from './validate-patch';

describe('validatePatch', () => {
  it('passes a good edit and names each bad field with its reason', () => {
    expect(validatePatch(books, { title: 'The Ferryman’s Almanac', rating: 3.5 })).toEqual({});
    expect(validatePatch(books, { rating: 4.25, status: 'lost', colour: 'red' })).toEqual({
      rating: 'must be in steps of 0.5',
      status: 'must be one of tbr, reading, paused, finished, dnf',
      colour: 'is not a field of this collection',
    });
  });

  it('does not treat inherited object keys as fields', () => {
    expect(validatePatch(books, { toString: 'x' })).toEqual({ toString: 'is not a field of this collection' });
  });
});
