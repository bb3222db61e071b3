import { TZDate } from '@date-fns/tz';
import { format, startOfDay } from 'date-fns';
import { assertTimeZone } from '../calendar/assert-time-zone';
import { DailyLogEntry, LogSession } from './log-session';

/**
 * Minutes and pages per local calendar day, sorted by day, for days with any reading.
 *
 * A session that crosses local midnight is split between the days in proportion to the wall
 * time it spent in each: 23:30–00:30 with 60 active minutes gives 30 to each day. We do not
 * know when within a session the pauses fell, so spreading them evenly is the fairest guess.
 * Pages are split the same way, so a day may hold a fraction of a page. Days are the reader's
 * local days in `timeZone`, so a DST day has 23 or 25 hours. Negative pages count as 0; a
 * session that ends before it starts counts wholly on the day it started.
 *
 * @example
 * dailyLog([{ startedAt: '2026-03-08T07:30:00.000Z', endedAt: '2026-03-08T08:30:00.000Z',
 *             activeMinutes: 60, pages: 20 }], 'America/Los_Angeles')
 * // [{ day: '2026-03-07', minutes: 30, pages: 10 }, { day: '2026-03-08', minutes: 30, pages: 10 }]
 */
export function dailyLog(sessions: readonly LogSession[], timeZone: string): DailyLogEntry[] {
  assertTimeZone(timeZone);
  const byDay = new Map<string, { minutes: number; pages: number }>();
  const add = (day: string, minutes: number, pages: number): void => {
    const entry = byDay.get(day) ?? { minutes: 0, pages: 0 };
    entry.minutes += minutes;
    entry.pages += pages;
    byDay.set(day, entry);
  };

  for (const session of sessions) {
    const start = parseInstant(session.startedAt);
    const end = parseInstant(session.endedAt);
    const minutes = Math.max(0, session.activeMinutes);
    const pages = Math.max(0, session.pages ?? 0);
    if (end <= start) {
      add(dayAt(start, timeZone), minutes, pages);
      continue;
    }
    for (let cursor = start; cursor < end;) {
      const next = nextDayStart(cursor, timeZone);
      // A day boundary not after the cursor would loop forever; fail instead.
      if (!(next > cursor)) throw new Error(`No day boundary after ${new Date(cursor).toISOString()} in ${timeZone}`);
      const segmentEnd = Math.min(next, end);
      const share = (segmentEnd - cursor) / (end - start);
      add(dayAt(cursor, timeZone), minutes * share, pages * share);
      cursor = segmentEnd;
    }
  }

  return [...byDay]
    .filter(([, entry]) => entry.minutes > 0 || entry.pages > 0)
    .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0))
    .map(([day, entry]) => ({ day, minutes: entry.minutes, pages: entry.pages }));
}

function parseInstant(iso: string): number {
  const ms = Date.parse(iso);
  if (!Number.isFinite(ms)) throw new RangeError(`Not a timestamp: ${iso}`);
  return ms;
}

function dayAt(ms: number, timeZone: string): string {
  return format(new TZDate(ms, timeZone), 'yyyy-MM-dd');
}

/** The first instant of the local day after the one containing `ms`. */
function nextDayStart(ms: number, timeZone: string): number {
  const local = new TZDate(ms, timeZone);
  // Start from noon of the next day, not addDays(startOfDay): where midnight is skipped by DST
  // (America/Havana, America/Santiago) the day starts at 01:00, and adding a day to that would
  // give 01:00 of a next day that does start at midnight.
  const nextNoon = new TZDate(local.getFullYear(), local.getMonth(), local.getDate() + 1, 12, 0, 0, timeZone);
  return startOfDay(nextNoon).getTime();
}
