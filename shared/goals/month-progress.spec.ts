import fc from 'fast-check';
import { monthProgress } from './month-progress';
import { expectProperty } from '../testing/expect-property';

describe('monthProgress', () => {
  it('puts each unit with a target beside what was read', () => {
    // Worked by hand: 2 of 4 books is half; 1 350 of 1 200 pages is 1.125 and met.
    expect(monthProgress({ targets: { books: 4, pages: 1200 }, actuals: { books: 2, pages: 1350, minutes: 600 } })).toEqual([
      { unit: 'books', target: 4, actual: 2, remaining: 2, fraction: 0.5, met: false },
      { unit: 'pages', target: 1200, actual: 1350, remaining: 0, fraction: 1.125, met: true },
    ]);
  });

  it('reads a missing amount as nothing read yet', () => {
    // Hand: 0 of 900 minutes.
    expect(monthProgress({ targets: { minutes: 900 }, actuals: {} })).toEqual([
      { unit: 'minutes', target: 900, actual: 0, remaining: 900, fraction: 0, met: false },
    ]);
  });

  it('has no rows without targets', () => {
    expect(monthProgress({ targets: {}, actuals: { books: 3 } })).toEqual([]);
  });

  it('keeps remaining, fraction and met consistent', () => {
    // Definitions: remaining = max(0, target − actual); met ⇔ actual ≥ target ⇔ fraction ≥ 1.
    expectProperty(
      fc.property(fc.integer({ min: 1, max: 50_000 }), fc.integer({ min: 0, max: 50_000 }), (target, actual) => {
        const [row] = monthProgress({ targets: { pages: target }, actuals: { pages: actual } });
        expect(row.remaining).toBe(Math.max(0, target - actual));
        expect(row.met).toBe(actual >= target);
        expect(row.fraction >= 1).toBe(row.met);
      }),
    );
  });

  it('refuses a target of zero and negative amounts', () => {
    expect(() => monthProgress({ targets: { books: 0 }, actuals: {} })).toThrowError(RangeError);
    expect(() => monthProgress({ targets: { books: 2 }, actuals: { books: -1 } })).toThrowError(RangeError);
  });
});
