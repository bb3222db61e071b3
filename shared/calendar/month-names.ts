/** English month names, January first (index = month − 1): for English-only text such as the mails. */
export const MONTH_NAMES = ['January', 'February', 'March', 'April', 'May', 'June', 'July', 'August', 'September', 'October', 'November', 'December'] as const;

type NameWidth = 'long' | 'short' | 'narrow';

const cache = new Map<string, readonly string[]>();

/** Names from Intl for twelve (or seven) UTC instants, cached per locale and width. */
function names(key: string, count: number, instant: (index: number) => Date, options: Intl.DateTimeFormatOptions, locale: string): readonly string[] {
  let found = cache.get(key);
  if (!found) {
    const format = new Intl.DateTimeFormat(locale, { ...options, timeZone: 'UTC' });
    found = Object.freeze(Array.from({ length: count }, (_, index) => format.format(instant(index))));
    cache.set(key, found);
  }
  return found;
}

/**
 * The month names of a locale, January first, as Intl writes a month alone ('March', 'mars',
 * 'März'): for sentences ('the most in March') and chart axes ('Mar').
 *
 * @example
 * monthNames('fr-FR')[2] // 'mars'
 * monthNames('en-GB', 'short')[8] // 'Sept' (as Intl writes it)
 */
export function monthNames(locale: string, width: NameWidth = 'long'): readonly string[] {
  return names(`month|${locale}|${width}`, 12, (index) => new Date(Date.UTC(2026, index, 15)), { month: width }, locale);
}

/**
 * The weekday names of a locale, Monday first (ISO 8601 weeks start on Monday).
 *
 * @example
 * weekdayNames('en-GB', 'narrow') // ['M', 'T', 'W', 'T', 'F', 'S', 'S']
 */
export function weekdayNames(locale: string, width: NameWidth = 'long'): readonly string[] {
  // 2026-01-05 is a Monday.
  return names(`weekday|${locale}|${width}`, 7, (index) => new Date(Date.UTC(2026, 0, 5 + index)), { weekday: width }, locale);
}

/**
 * A calendar day ('2026-03-14') as day and month in a locale ('14 March', 'March 14', '14. März').
 *
 * @example
 * dayMonthText('2026-03-14', 'en-GB') // '14 March'
 */
export function dayMonthText(day: string, locale: string): string {
  const [year, month, date] = day.split('-').map(Number) as [number, number, number];
  return new Intl.DateTimeFormat(locale, { day: 'numeric', month: 'long', timeZone: 'UTC' }).format(new Date(Date.UTC(year, month - 1, date)));
}
