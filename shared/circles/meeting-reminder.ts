import { addDays, parseISO, format } from 'date-fns';

import { localDay } from '../calendar/local-day';

/** Meeting reminders go out from this local hour on, not in the night (as loan reminders). */
export const REMINDER_FIRST_HOUR = 8;

/** The zone a reminder is reckoned in: the member's own when the server knows it and it is a real IANA zone, else UTC. */
export function reminderZone(...candidates: readonly (string | null | undefined)[]): string {
  for (const zone of candidates) {
    if (!zone) continue;
    try {
      new Intl.DateTimeFormat('en', { timeZone: zone });
      return zone;
    } catch {
      // an unknown zone: try the next one
    }
  }
  return 'UTC';
}

/**
 * Whether a member should get the reminder of a meeting on `meetingDay` (YYYY-MM-DD, the
 * meeting's own calendar day) at the instant `now`: it is the day before in the member's time
 * zone, from `REMINDER_FIRST_HOUR` on.
 */
export function meetingReminderDue(meetingDay: string, now: Date, timeZone: string): boolean {
  const today = localDay(now.toISOString(), timeZone);
  const hour = Number(new Intl.DateTimeFormat('en-GB', { timeZone, hour: '2-digit', hourCycle: 'h23' }).format(now));
  return hour >= REMINDER_FIRST_HOUR && format(addDays(parseISO(today), 1), 'yyyy-MM-dd') === meetingDay;
}

/** The meeting days some member somewhere (UTC−12 to UTC+14) may be reminded of at `now`: the candidates to look up. */
export function candidateMeetingDays(now: Date): string[] {
  const utcDay = now.toISOString().slice(0, 10);
  return [0, 1, 2].map((days) => format(addDays(parseISO(utcDay), days), 'yyyy-MM-dd'));
}
