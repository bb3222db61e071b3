import { GoalPacing } from './goal-pacing';
import { GoalUnit } from './goal-unit';

const SINGULAR: Readonly<Record<GoalUnit, string>> = { books: 'book', pages: 'page', minutes: 'minute' };

/**
 * One calm line about a yearly goal's pace, for the reader's eyes. It says what would get them
 * there rather than how far they are from it, and never scolds (no "behind", no "!").
 *
 * Books are shown to one decimal place, pages and minutes as whole numbers.
 *
 * @example
 * pacingMessage(goalPacing({ target: 52, actual: 29, year: 2026, today: '2026-07-01' }), 'books')
 * // '3.2 books past the even-pace marker'
 * pacingMessage(goalPacing({ target: 52, actual: 20, year: 2026, today: '2026-07-01' }), 'books')
 * // 'About 1.2 books a week from now gets you there'
 */
export function pacingMessage(pacing: GoalPacing, unit: GoalUnit): string {
  const figure = (value: number): string => value.toLocaleString('en', { maximumFractionDigits: unit === 'books' ? 1 : 0 });
  const amount = (value: number): string => `${figure(value)} ${figure(value) === '1' ? SINGULAR[unit] : unit}`;
  const { target, actual, neededPerWeek, status, difference, daysElapsed, daysInYear } = pacing;
  const daysLeft = daysInYear - daysElapsed;

  if (actual >= target) return `Goal of ${amount(target)} reached`;
  if (neededPerWeek === null) return `The year closed at ${figure(actual)} of ${amount(target)}`;
  if (status === 'ahead') return `${amount(difference)} past the even-pace marker`;
  if (status === 'on-track') return `Right on an even pace for ${amount(target)}`;
  // In the last week a rate per week reads oddly ("7 books a week"); say what is left instead.
  if (daysLeft <= 7) return `${amount(target - actual)} to go for the year`;
  return `About ${amount(neededPerWeek)} a week from now gets you there`;
}
