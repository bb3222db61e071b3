import fc from 'fast-check';
import { booksFinishedIn } from './books-finished-in';
import { expectProperty } from '../testing/expect-property';
import { inventedBook as book } from './testing/invented-book';

describe('booksFinishedIn', () => {
  it('keeps finished books inside the period, both ends included, earliest first then by id', () => {
    // Our rule; RFC 3339 §5.1: same-shaped dates sort as text in time order.
    const books = [
      book('c', '2026-12-31'),
      book('b', '2026-01-01'),
      book('a', '2026-01-01'),
      book('x', '2027-01-01'),
      book('r', '2026-05-05', 'reading'),
      book('n', undefined),
    ];
    expect(booksFinishedIn(books, { start: '2026-01-01', end: '2026-12-31' }).map((entry) => entry.id)).toEqual(['a', 'b', 'c']);
  });

  it('counts a book finished twice in the period once, on its latest finish there (our rule)', () => {
    const books = [book('a', '2025-06-01'), book('a', '2026-02-10'), book('a', '2026-09-30'), book('b', '2026-05-05')];
    expect(booksFinishedIn(books, { start: '2026-01-01', end: '2026-12-31' }).map((entry) => [entry.id, entry.finishedOn])).toEqual([
      ['b', '2026-05-05'],
      ['a', '2026-09-30'],
    ]);
    // A re-read counts again in a later period.
    expect(booksFinishedIn(books, { start: '2025-01-01', end: '2025-12-31' }).map((entry) => entry.finishedOn)).toEqual(['2025-06-01']);
    expect(booksFinishedIn(books, { start: '2026-02-01', end: '2026-02-28' }).map((entry) => entry.finishedOn)).toEqual(['2026-02-10']);
  });

  it('agrees with comparing time values, for any dates', () => {
    // Reference: ECMA-262 Date.parse of a date-only ISO string is UTC midnight of that day.
    const day = fc
      .date({ min: new Date('1900-01-01T00:00:00Z'), max: new Date('2100-12-31T00:00:00Z'), noInvalidDate: true })
      .map((date) => date.toISOString().slice(0, 10));
    expectProperty(
      fc.property(fc.array(day, { maxLength: 20 }), day, day, (days, a, b) => {
        const [start, end] = Date.parse(a) <= Date.parse(b) ? [a, b] : [b, a];
        const books = days.map((finishedOn, index) => book(`b${String(index).padStart(2, '0')}`, finishedOn));
        const kept = booksFinishedIn(books, { start, end });
        const expected = books.filter((entry) => Date.parse(entry.finishedOn!) >= Date.parse(start) && Date.parse(entry.finishedOn!) <= Date.parse(end));
        expect(kept.length).toBe(expected.length);
        for (let index = 1; index < kept.length; index++) {
          expect(Date.parse(kept[index - 1].finishedOn)).toBeLessThanOrEqual(Date.parse(kept[index].finishedOn));
        }
      }),
    );
  });

  it('refuses a finished book whose date is not a calendar date', () => {
    expect(() => booksFinishedIn([book('bad', '2026-02-30')], { start: '2026-01-01', end: '2026-12-31' })).toThrowError(RangeError);
  });
});
