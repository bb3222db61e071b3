import { TZDate, tz } from '@date-fns/tz';
import { format } from 'date-fns';

import { assertTimeZone } from './assert-time-zone';

// The value of <input type="datetime-local">: minutes, optionally seconds (WHATWG HTML,
// "valid normalized local date and time string").
const LOCAL_DATE_TIME = /^(\d{4})-(\d{2})-(\d{2})T(\d{2}):(\d{2})(?::(\d{2})(?:\.\d{1,3})?)?$/;

/**
 * The wall-clock time of an instant in the reader's zone, as `<input type="datetime-local">`
 * shows it: 'YYYY-MM-DDTHH:mm' (seconds dropped).
 *
 * @throws RangeError for an unreadable timestamp or an unknown zone.
 * @example
 * localDateTime('2026-03-08T07:30:00.000Z', 'America/Los_Angeles') // '2026-03-07T23:30'
 * localDateTime('2026-03-08T07:30:00.000Z', 'Asia/Tokyo')          // '2026-03-08T16:30'
 */
export function localDateTime(timestamp: string, timeZone: string): string {
  assertTimeZone(timeZone);
  const ms = Date.parse(timestamp);
  if (!Number.isFinite(ms)) throw new RangeError(`Not a timestamp: ${timestamp}`);
  return format(new Date(ms), "yyyy-MM-dd'T'HH:mm", { in: tz(timeZone) });
}

/**
 * The instant a wall-clock time names in the reader's zone, as a UTC timestamp ('…Z'); null when
 * the text is not a date and time. A time skipped by a DST change (02:30 on the night clocks go
 * forward) moves forward by the gap, and a time that happens twice (01:30 on the night they go
 * back) is the first of the two, as Temporal's "compatible" disambiguation does.
 *
 * @example
 * instantFromLocalDateTime('2026-03-07T23:30', 'America/Los_Angeles') // '2026-03-08T07:30:00.000Z'
 * instantFromLocalDateTime('2026-03-08T02:30', 'America/Los_Angeles') // '2026-03-08T10:30:00.000Z' (03:30 PDT)
 */
export function instantFromLocalDateTime(value: string, timeZone: string): string | null {
  assertTimeZone(timeZone);
  const match = LOCAL_DATE_TIME.exec(value.trim());
  if (!match) return null;
  const [year, month, day, hour, minute, second] = match.slice(1).map((part) => Number(part ?? 0)) as number[];
  if (month! < 1 || month! > 12 || day! < 1 || day! > 31 || hour! > 23 || minute! > 59 || second! > 59) return null;
  const local = new TZDate(year!, month! - 1, day!, hour!, minute!, second!, timeZone);
  // TZDate rolls 31 April over to 1 May; refuse such dates instead.
  if (local.getFullYear() !== year || local.getMonth() !== month! - 1 || local.getDate() !== day) return null;
  // Years 0–99 would be read as 1900–1999 by the Date constructor; no reading session is that old.
  if (year! < 1000) return null;
  return new Date(local.getTime()).toISOString();
}
