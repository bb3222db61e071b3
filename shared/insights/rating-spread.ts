/** How many books got each rating, and the middle of them. */
export interface RatingSpread {
  /** One entry per possible rating, 0.5 to 5 in half stars, lowest first. */
  readonly bins: readonly { readonly rating: number; readonly count: number }[];
  /** How many ratings there were (unrated books are left out). */
  readonly rated: number;
  /** Arithmetic mean, or null with no ratings. */
  readonly mean: number | null;
  /** Median (mean of the two middle ratings for an even count), or null with no ratings. */
  readonly median: number | null;
}

/** The ratings Lamplight stores: half stars from 0.5 to 5 (see the books collection). */
export const RATING_STEPS: readonly number[] = Array.from({ length: 10 }, (_, i) => (i + 1) / 2);

/**
 * The spread of the reader's ratings. Missing ratings (null/undefined) are left out, so an
 * unrated book does not pull the mean down.
 *
 * @throws RangeError for a rating that is not a half step from 0.5 to 5.
 * @example
 * ratingSpread([4, 5, 3.5, null]) // { rated: 3, mean: 4.1666…, median: 4, bins: [… { rating: 4, count: 1 } …] }
 */
export function ratingSpread(ratings: readonly (number | null | undefined)[]): RatingSpread {
  const given = ratings.filter((rating): rating is number => rating != null);
  const counts = new Map(RATING_STEPS.map((step) => [step, 0]));
  for (const rating of given) {
    const count = counts.get(rating);
    if (count === undefined) throw new RangeError(`Not a rating from 0.5 to 5 in half stars: ${rating}`);
    counts.set(rating, count + 1);
  }
  const sorted = [...given].sort((a, b) => a - b);
  const middle = sorted.length / 2;
  const median = sorted.length === 0 ? null : sorted.length % 2 === 1 ? sorted[Math.floor(middle)] : (sorted[middle - 1] + sorted[middle]) / 2;
  return {
    bins: RATING_STEPS.map((rating) => ({ rating, count: counts.get(rating) ?? 0 })),
    rated: sorted.length,
    mean: sorted.length === 0 ? null : sorted.reduce((sum, rating) => sum + rating, 0) / sorted.length,
    median,
  };
}
