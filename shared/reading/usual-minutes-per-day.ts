import { dailyLog } from '../reading-log/daily-log';
import { dayFromIndex } from '../reading-log/day-from-index';
import { dayIndex } from '../reading-log/day-index';
import { LogSession } from '../reading-log/log-session';

const MS_PER_DAY = 86_400_000;

/**
 * The reader's usual reading minutes per day: the mean over the last `windowDays` local days
 * up to and including `today`, counting days without reading as 0.
 *
 * Mean over all days, not the median of reading days, because forecasts spread the minutes
 * over calendar days: someone who reads 60 minutes on three days a week moves through a book
 * at about 26 minutes a day, and the median of their reading days (60) would promise more
 * than twice the real progress. One long day weighs at most 1/windowDays of it.
 *
 * The window starts no earlier than the first day in `sessions`, so a reader who began a week
 * ago is not averaged over 28 days. Today counts even when it is only half over, which
 * lowers the figure by at most one day's share. Minutes of a session across midnight are split
 * as in `dailyLog`.
 *
 * @example
 * usualMinutesPerDay(
 *   [{ startedAt: '2026-03-02T20:00:00Z', endedAt: '2026-03-02T21:00:00Z', activeMinutes: 60 },
 *    { startedAt: '2026-03-05T20:00:00Z', endedAt: '2026-03-05T20:30:00Z', activeMinutes: 30 }],
 *   '2026-03-07', 'UTC') // 15 (90 minutes over the 6 days 2–7 March)
 */
export function usualMinutesPerDay(sessions: readonly LogSession[], today: string, timeZone: string, windowDays = 28): number {
  if (!Number.isInteger(windowDays) || windowDays < 1) {
    throw new RangeError(`windowDays must be a whole number ≥ 1, not ${windowDays}`);
  }
  const todayIndex = dayIndex(today);
  const windowStart = dayFromIndex(todayIndex - windowDays + 1);
  // Only sessions that reach into the window are split into local days (the costly part, once per
  // session and day in the time zone): one that ended over a day before the window's first
  // midnight in UTC lies before it in every zone (offsets are within ±14 hours), and only says
  // that the reader's log began before the window.
  const before = (dayIndex(windowStart) - 1) * MS_PER_DAY;
  let readBefore = false;
  const inWindow = sessions.filter((session) => {
    const last = Math.max(Date.parse(session.startedAt), Date.parse(session.endedAt));
    if (!(last < before)) return true; // a malformed time too: dailyLog says what is wrong
    readBefore ||= session.activeMinutes > 0 || (session.pages ?? 0) > 0;
    return false;
  });
  const log = dailyLog(inWindow, timeZone);
  const firstDay = readBefore ? windowStart : log[0]?.day;
  if (firstDay === undefined) return 0;
  const start = firstDay > windowStart ? firstDay : windowStart;
  if (start > today) return 0;

  const minutes = log.filter((e) => e.day >= start && e.day <= today).reduce((sum, e) => sum + e.minutes, 0);
  return minutes / (todayIndex - dayIndex(start) + 1);
}
