const MS_PER_DAY = 86_400_000;

/**
 * The number of days from 1970-01-01 to a calendar date 'YYYY-MM-DD' (proleptic Gregorian).
 * Calendar dates have no time zone, so plain day numbers make differences and runs exact,
 * with no DST to trip over. Throws RangeError for a malformed or impossible date.
 *
 * @example
 * dayIndex('1970-01-02') // 1
 * dayIndex('2028-03-01') - dayIndex('2028-02-28') // 2 (2028 is a leap year)
 */
export function dayIndex(day: string): number {
  const match = /^(\d{4})-(\d{2})-(\d{2})$/.exec(day);
  if (!match) throw new RangeError(`Not a YYYY-MM-DD date: ${day}`);
  const [year, month, date] = [Number(match[1]), Number(match[2]), Number(match[3])];
  const utc = new Date(0);
  // setUTCFullYear, not Date.UTC: Date.UTC reads years 0–99 as 1900–1999.
  utc.setUTCFullYear(year, month - 1, date);
  if (utc.getUTCFullYear() !== year || utc.getUTCMonth() !== month - 1 || utc.getUTCDate() !== date) {
    throw new RangeError(`No such date: ${day}`);
  }
  return Math.round(utc.getTime() / MS_PER_DAY);
}
