const MS_PER_DAY = 86_400_000;

/**
 * The calendar date 'YYYY-MM-DD' that is `index` days after 1970-01-01; the inverse of
 * `dayIndex`. Only years 0000–9999 can be written in that form.
 *
 * @example
 * dayFromIndex(0)     // '1970-01-01'
 * dayFromIndex(20520) // '2026-03-08'
 */
export function dayFromIndex(index: number): string {
  if (!Number.isInteger(index)) throw new RangeError(`Not a whole day number: ${index}`);
  const iso = new Date(index * MS_PER_DAY).toISOString();
  if (!/^\d{4}-/.test(iso)) throw new RangeError(`Year out of range 0000–9999 for day ${index}`);
  return iso.slice(0, 10);
}
