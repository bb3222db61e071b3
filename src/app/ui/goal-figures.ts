import type { GoalUnit } from '@shared/goals/goal-unit';

const SINGULAR: Readonly<Record<GoalUnit, string>> = { books: 'book', pages: 'page', minutes: 'minute' };

/** Names of the units as headings. */
export const UNIT_LABELS: Readonly<Record<GoalUnit, string>> = { books: 'Books', pages: 'Pages', minutes: 'Minutes' };

/**
 * A figure as pacingMessage writes it: books to one decimal place, pages and minutes whole.
 *
 * @example
 * goalFigure(3.24, 'books') // '3.2'
 * goalFigure(1487.6, 'pages') // '1,488'
 */
export function goalFigure(value: number, unit: GoalUnit): string {
  return value.toLocaleString('en', { maximumFractionDigits: unit === 'books' ? 1 : 0 });
}

/**
 * A figure with its unit, singular for exactly one.
 *
 * @example
 * goalAmount(1, 'books') // '1 book'
 * goalAmount(412.4, 'pages') // '412 pages'
 */
export function goalAmount(value: number, unit: GoalUnit): string {
  const figure = goalFigure(value, unit);
  return `${figure} ${figure === '1' ? SINGULAR[unit] : unit}`;
}

/**
 * A difference with its sign, using the minus sign (U+2212) rather than a hyphen.
 *
 * @example
 * signedFigure(-1.25, 'books') // '−1.3'
 * signedFigure(0.01, 'books') // '0'
 */
export function signedFigure(value: number, unit: GoalUnit): string {
  const figure = goalFigure(Math.abs(value), unit);
  if (figure === '0') return '0';
  return `${value > 0 ? '+' : '\u2212'}${figure}`;
}

/** The amounts of a period in one line: '3 books · 412 pages · 610 minutes'. */
export function amountsLine(amounts: Readonly<Record<GoalUnit, number>>): string {
  return (['books', 'pages', 'minutes'] as const).map((unit) => goalAmount(amounts[unit], unit)).join(' · ');
}
