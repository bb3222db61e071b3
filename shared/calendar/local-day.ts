import { tz } from '@date-fns/tz';
import { format, isValid, parseISO } from 'date-fns';

import { assertTimeZone } from './assert-time-zone';

// Without an offset parseISO would read the time in the machine's zone; we never want that.
const HAS_OFFSET = /T[^+-]*(?:Z|[+-]\d{2}(?::?\d{2})?)$/i;

/**
 * The reader's calendar date ('YYYY-MM-DD') at an instant, in their IANA time zone.
 *
 * @param timestamp ISO 8601 with 'Z' or an offset, e.g. '2026-01-04T23:30:00Z'.
 * @param timeZone IANA name such as 'Asia/Tokyo'.
 * @throws RangeError for a timestamp without an offset, an unreadable one, or an unknown zone.
 * @example
 * localDay('2026-01-04T23:30:00Z', 'Asia/Tokyo') // '2026-01-05'
 * localDay('2026-01-04T23:30:00Z', 'America/Los_Angeles') // '2026-01-04'
 */
export function localDay(timestamp: string, timeZone: string): string {
  const instant = parseISO(timestamp);
  if (!HAS_OFFSET.test(timestamp) || !isValid(instant)) {
    throw new RangeError(`Not an ISO 8601 timestamp with an offset: ${timestamp}`);
  }
  assertTimeZone(timeZone);
  return format(instant, 'yyyy-MM-dd', { in: tz(timeZone) });
}
