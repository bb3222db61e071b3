import { TZDate } from '@date-fns/tz';
import { format } from 'date-fns';
import { assertTimeZone } from './assert-time-zone';

/**
 * The reader's calendar day ('YYYY-MM-DD') at an instant, in their IANA time zone.
 *
 * @example
 * localDay('2026-03-08T09:30:00.000Z', 'America/Los_Angeles') // '2026-03-08' (01:30 PST)
 * localDay('2026-03-07T15:30:00.000Z', 'Asia/Tokyo')          // '2026-03-08' (00:30 JST)
 */
export function localDay(instant: string | number, timeZone: string): string {
  assertTimeZone(timeZone);
  const ms = typeof instant === 'number' ? instant : Date.parse(instant);
  if (!Number.isFinite(ms)) throw new RangeError(`Not a timestamp: ${String(instant)}`);
  return format(new TZDate(ms, timeZone), 'yyyy-MM-dd');
}
