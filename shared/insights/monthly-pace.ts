import { GoalSessionRow, monthPeriod, sessionLog } from '../goals/amounts-in';

/** A month's print reading: pages, the minutes they took, and the pace. */
export interface MonthPace {
  /** 'YYYY-MM'. */
  readonly month: string;
  readonly pages: number;
  readonly minutes: number;
  /** Pages per hour, or null in a month without timed print pages. */
  readonly pagesPerHour: number | null;
}

/**
 * Pages per hour in each month of `year` (twelve entries, January first), from print sessions
 * that record both pages and active minutes. Sessions without pages (ebook percents, audiobook
 * minutes, a print session with no page numbers) are left out, so they do not dilute the pace.
 * Days are the reader's local days in `timeZone`; a session across midnight at a month's end
 * is shared between the months in proportion (see `dailyLog`).
 *
 * @example
 * monthlyPace([{ format: 'print', startedAt: '2026-03-02T20:00:00Z', endedAt: '2026-03-02T21:00:00Z',
 *                activeMinutes: 60, fromPosition: 10, toPosition: 50 }], 2026, 'UTC')[2]
 * // { month: '2026-03', pages: 40, minutes: 60, pagesPerHour: 40 }
 */
export function monthlyPace(sessions: readonly GoalSessionRow[], year: number, timeZone: string): MonthPace[] {
  const timed = sessions.filter(
    (session) =>
      session.format === 'print' &&
      (session.activeMinutes ?? 0) > 0 &&
      session.fromPosition != null &&
      session.toPosition != null &&
      session.toPosition > session.fromPosition,
  );
  const log = sessionLog(timed, timeZone);
  return Array.from({ length: 12 }, (_, index) => {
    const { start, end } = monthPeriod(year, index + 1);
    let pages = 0;
    let minutes = 0;
    for (const entry of log) {
      // Same-shaped ISO 8601 dates sort as text in time order (RFC 3339 §5.1).
      if (entry.day < start || entry.day > end) continue;
      pages += entry.pages;
      minutes += entry.minutes;
    }
    return { month: start.slice(0, 7), pages, minutes, pagesPerHour: minutes > 0 ? (pages / minutes) * 60 : null };
  });
}
