import { formatHlc, MAX_CLOCK_AHEAD_MS } from './hlc';
import { validateChange } from './validate-change';

const NOW = Date.UTC(2026, 11, 1, 20, 14);
const ok = {
  id: '6f1c1f52-3d1e-4d35-9a7c-1a2b3c4d5e6f',
  collection: 'books',
  rowId: '0b7e5c1e-8f8a-4c61-b1f2-9d7a6c5b4e3d',
  field: 'title',
  value: 'The Salt Road Almanac',
  hlc: formatHlc({ wall: NOW, counter: 0, node: 'tablet' }),
};
const reason = (change: unknown) => validateChange(change, 3, NOW);

describe('validateChange', () => {
  it('accepts a well-formed change to any single field of a row (rows arrive in pieces)', () => {
    expect(reason(ok)).toBeNull();
    expect(reason({ ...ok, field: 'rating', value: 4.5 })).toBeNull();
    expect(reason({ ...ok, field: 'rating', value: null })).toBeNull();
    expect(reason({ ...ok, field: 'deleted', value: true })).toBeNull();
  });

  it('names the index, the field and the reason for a bad value', () => {
    expect(reason({ ...ok, field: 'rating', value: 4.25 })).toEqual({ index: 3, id: ok.id, code: 'invalid_value', reason: 'books.rating must be in steps of 0.5' });
    expect(reason({ ...ok, field: 'rating', value: 0 })?.reason).toBe('books.rating must be at least 0.5');
    expect(reason({ ...ok, field: 'format', value: 'scroll' })?.reason).toBe('books.format must be one of print, ebook, audiobook');
    expect(reason({ ...ok, field: 'title', value: 'x'.repeat(501) })?.reason).toBe('books.title must be at most 500 characters');
    expect(reason({ ...ok, field: 'pageCount', value: 12.5 })?.reason).toBe('books.pageCount must be a whole number');
  });

  it('accepts only ISBN-13 digits with a right check digit (ISO 2108; ISBN Users’ Manual example 978-92-95055-12-4)', () => {
    expect(reason({ ...ok, field: 'isbn', value: '9789295055124' })).toBeNull();
    expect(reason({ ...ok, field: 'isbn', value: '978-92-95055-12-4' })?.code).toBe('invalid_value');
    expect(reason({ ...ok, field: 'isbn', value: '9789295055125' })?.reason).toContain('check digit');
    expect(reason({ ...ok, field: 'isbn', value: '0843610727' })?.code).toBe('invalid_value'); // ISBN-10: convert first
  });

  it('refuses unknown collections and fields, and reserved sync fields', () => {
    expect(reason({ ...ok, collection: 'scrolls' })?.code).toBe('unknown_collection');
    expect(reason({ ...ok, field: 'colour' })?.code).toBe('unknown_field');
    expect(reason({ ...ok, field: 'hlc' })?.code).toBe('unknown_field');
    expect(reason({ ...ok, collection: 'toString' })?.code).toBe('unknown_collection');
  });

  it('refuses malformed ids and clocks', () => {
    expect(reason({ ...ok, id: 'one' })?.reason).toBe('id must be a lower-case UUID');
    expect(reason({ ...ok, id: ok.id.toUpperCase() })?.reason).toBe('id must be a lower-case UUID');
    expect(reason({ ...ok, rowId: 'row-1' })?.reason).toBe('rowId must be a lower-case UUID');
    expect(reason({ ...ok, hlc: 'yesterday' })?.code).toBe('invalid_change');
    expect(reason('nope')?.code).toBe('invalid_change');
  });

  it('refuses a clock more than 24 hours ahead of the server with clock_ahead', () => {
    const ahead = formatHlc({ wall: NOW + MAX_CLOCK_AHEAD_MS + 1, counter: 0, node: 'tablet' });
    expect(reason({ ...ok, hlc: ahead })?.code).toBe('clock_ahead');
    expect(reason({ ...ok, hlc: formatHlc({ wall: NOW + MAX_CLOCK_AHEAD_MS, counter: 0, node: 'tablet' }) })).toBeNull();
  });
});
