import { IsoWeekDate } from './iso-week';

/**
 * Writes an ISO 8601 week date in extended form: 'YYYY-Www-D', or 'YYYY-Www' without a weekday.
 *
 * @throws RangeError for a year outside 0–9999, a week outside 1–53 or a weekday outside 1–7.
 * @example
 * formatIsoWeek({ year: 2009, week: 1, weekday: 1 }) // '2009-W01-1'
 * formatIsoWeek({ year: 2026, week: 53 }) // '2026-W53'
 */
export function formatIsoWeek(date: Pick<IsoWeekDate, 'year' | 'week'> & { readonly weekday?: number }): string {
  const { year, week, weekday } = date;
  // Four-digit years only: ISO 8601 needs an agreed expansion (and a sign) beyond them.
  if (!Number.isInteger(year) || year < 0 || year > 9999) throw new RangeError(`Year out of range: ${year}`);
  if (!Number.isInteger(week) || week < 1 || week > 53) throw new RangeError(`Week out of range: ${week}`);
  if (weekday !== undefined && (!Number.isInteger(weekday) || weekday < 1 || weekday > 7)) {
    throw new RangeError(`Weekday out of range: ${weekday}`);
  }
  const base = `${String(year).padStart(4, '0')}-W${String(week).padStart(2, '0')}`;
  return weekday === undefined ? base : `${base}-${weekday}`;
}
