import fc from 'fast-check';
import { mean, median } from 'simple-statistics';

import { ratingSpread, RATING_STEPS } from './rating-spread';
import { expectProperty } from '../testing/expect-property';

describe('ratingSpread', () => {
  it('counts each half-star rating and leaves unrated books out (worked by hand)', () => {
    const spread = ratingSpread([4, 5, 3.5, null, 4, undefined]);
    expect(spread.rated).toBe(4);
    expect(spread.bins.find((bin) => bin.rating === 4)?.count).toBe(2);
    expect(spread.bins.find((bin) => bin.rating === 0.5)?.count).toBe(0);
    // (4 + 5 + 3.5 + 4) / 4 = 16.5 / 4 = 4.125; sorted 3.5, 4, 4, 5 → median (4 + 4) / 2 = 4.
    expect(spread.mean).toBe(4.125);
    expect(spread.median).toBe(4);
  });

  it('has ten bins from 0.5 to 5 and no mean or median without ratings', () => {
    expect(RATING_STEPS).toEqual([0.5, 1, 1.5, 2, 2.5, 3, 3.5, 4, 4.5, 5]);
    const spread = ratingSpread([null]);
    expect(spread.bins.length).toBe(10);
    expect(spread.mean).toBeNull();
    expect(spread.median).toBeNull();
  });

  it('agrees with simple-statistics (a general-purpose reference library) on mean and median', () => {
    expectProperty(
      fc.property(fc.array(fc.constantFrom(...RATING_STEPS), { minLength: 1, maxLength: 60 }), (ratings) => {
        const spread = ratingSpread(ratings);
        expect(spread.mean).toBeCloseTo(mean(ratings), 10);
        expect(spread.median).toBeCloseTo(median(ratings), 10);
        expect(spread.bins.reduce((sum, bin) => sum + bin.count, 0)).toBe(ratings.length);
      }),
    );
  });

  it('refuses a rating that is not a half star', () => {
    expect(() => ratingSpread([4.25])).toThrowError(RangeError, /4\.25/);
    expect(() => ratingSpread([0])).toThrowError(RangeError);
  });
});
