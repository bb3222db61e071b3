import { AmountsByUnit, GOAL_UNITS, GoalUnit } from './goal-unit';

/** Planned against done for one unit in a month. */
export interface MonthUnitProgress {
  readonly unit: GoalUnit;
  readonly target: number;
  readonly actual: number;
  /** What is still to do; 0 once met. */
  readonly remaining: number;
  /** actual / target; above 1 when the reader went past the target. */
  readonly fraction: number;
  readonly met: boolean;
}

/**
 * A month's targets beside what was read, one row per unit that has a target, in the order of
 * `GOAL_UNITS`. Amounts read in a unit without a target are left out; a missing amount is 0.
 *
 * @throws RangeError for a target ≤ 0 or a negative amount.
 * @example
 * monthProgress({ targets: { books: 4, pages: 1200 }, actuals: { books: 2, pages: 1350 } })
 * // [ { unit: 'books', target: 4, actual: 2, remaining: 2, fraction: 0.5, met: false },
 * //   { unit: 'pages', target: 1200, actual: 1350, remaining: 0, fraction: 1.125, met: true } ]
 */
export function monthProgress(input: { readonly targets: AmountsByUnit; readonly actuals: AmountsByUnit }): MonthUnitProgress[] {
  const rows: MonthUnitProgress[] = [];
  for (const unit of GOAL_UNITS) {
    const target = input.targets[unit];
    if (target === undefined) continue;
    const actual = input.actuals[unit] ?? 0;
    if (!(Number.isFinite(target) && target > 0)) throw new RangeError(`Target for ${unit} must be more than 0: ${target}`);
    if (!(Number.isFinite(actual) && actual >= 0)) throw new RangeError(`Amount of ${unit} must be 0 or more: ${actual}`);
    rows.push({ unit, target, actual, remaining: Math.max(target - actual, 0), fraction: actual / target, met: actual >= target });
  }
  return rows;
}
