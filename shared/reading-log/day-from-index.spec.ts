import fc from 'fast-check';
import { dayFromIndex } from './day-from-index';
import { dayIndex } from './day-index';
import { expectProperty } from '../testing/expect-property';

describe('dayFromIndex', () => {
  it('writes day numbers as dates', () => {
    // POSIX time: day 10 957 is 2000-01-01; 2026-03-08 is 20 520 days after 1970-01-01.
    expect(dayFromIndex(0)).toBe('1970-01-01');
    expect(dayFromIndex(10957)).toBe('2000-01-01');
    expect(dayFromIndex(20520)).toBe('2026-03-08');
    expect(dayFromIndex(-1)).toBe('1969-12-31');
  });

  it('is the inverse of dayIndex over years 0000–9999', () => {
    expectProperty(
      fc.property(fc.integer({ min: dayIndex('0000-01-01'), max: dayIndex('9999-12-31') }), (index) => {
        return dayIndex(dayFromIndex(index)) === index;
      }),
    );
  });

  it('refuses fractions and years that need more than four digits', () => {
    expect(() => dayFromIndex(1.5)).toThrowError(RangeError);
    expect(() => dayFromIndex(dayIndex('9999-12-31') + 1)).toThrowError(RangeError);
  });
});
