/** The ways Lamplight writes a date or a time; none shows seconds. */
export type DateStyle = 'day' | 'longDay' | 'dayMonth' | 'shortDay' | 'month' | 'monthName' | 'dayTime' | 'weekdayTime' | 'time';

const STYLES: Readonly<Record<DateStyle, Intl.DateTimeFormatOptions>> = {
  day: { dateStyle: 'medium' },
  longDay: { dateStyle: 'long' },
  dayMonth: { day: 'numeric', month: 'long' },
  shortDay: { day: 'numeric', month: 'short' },
  month: { month: 'long', year: 'numeric' },
  monthName: { month: 'long' },
  dayTime: { dateStyle: 'medium', timeStyle: 'short' },
  weekdayTime: { weekday: 'short', day: 'numeric', month: 'short', hour: 'numeric', minute: '2-digit' },
  time: { hour: 'numeric', minute: '2-digit' },
};

/** A calendar day ('2026-03-08') or month ('2026-03'): a date with no instant, drawn in UTC so it never shifts a day. */
const CALENDAR = /^(\d{4})-(\d{2})(?:-(\d{2}))?$/;

const formatters = new Map<string, Intl.DateTimeFormat>();

function formatter(locale: string, style: DateStyle, timeZone: string): Intl.DateTimeFormat {
  const key = `${locale}|${style}|${timeZone}`;
  let found = formatters.get(key);
  if (!found) {
    found = new Intl.DateTimeFormat(locale, { ...STYLES[style], timeZone });
    formatters.set(key, found);
  }
  return found;
}

/**
 * A date as the reader reads it, in their locale: calendar days as they are, instants in the
 * reader's time zone. Empty for no value or one that is not a date.
 *
 * @example
 * formatReaderDate('2026-03-08', 'day', 'en-GB', 'Europe/Oslo') // '8 Mar 2026'
 * formatReaderDate('2026-03-08T09:30:45Z', 'dayTime', 'en-GB', 'UTC') // '8 Mar 2026, 09:30'
 */
export function formatReaderDate(value: string | number | Date | null | undefined, style: DateStyle, locale: string, timeZone: string): string {
  if (value == null || value === '') return '';
  const calendar = typeof value === 'string' ? CALENDAR.exec(value) : null;
  const instant = calendar ? new Date(Date.UTC(Number(calendar[1]), Number(calendar[2]) - 1, Number(calendar[3] ?? 1))) : new Date(value);
  if (Number.isNaN(instant.getTime())) return '';
  return formatter(locale, style, calendar ? 'UTC' : timeZone).format(instant);
}

/** The locale to use: the reader's choice if this browser knows it, else the browser's own. */
export function resolveLocale(chosen: string | null | undefined, browser: string): string {
  if (chosen && isSupported(chosen)) return chosen;
  return isSupported(browser) ? browser : 'en';
}

/** Whether this browser has date formats for a locale (a malformed tag throws RangeError: not supported). */
function isSupported(locale: string): boolean {
  try {
    return Intl.DateTimeFormat.supportedLocalesOf([locale]).length > 0;
  } catch {
    return false;
  }
}
