import ical from 'ical-generator';

import type { CalendarEvent } from './calendar-event';

const DAY_MS = 86_400_000;

/** Midnight UTC of a 'YYYY-MM-DD' day: with no calendar time zone ical-generator prints it as that day. */
const utcMidnight = (day: string) => new Date(`${day}T00:00:00Z`);

/**
 * The iCalendar text (RFC 5545) of a reader's feed. ical-generator writes CRLF line ends and
 * folds lines at 75 octets (§3.1) and escapes TEXT (§3.3.11). Every event is all-day:
 * `DTSTART;VALUE=DATE` (§3.3.4) and `DTEND` the next day, non-inclusive (§3.6.1).
 */
export function buildFeed(events: readonly CalendarEvent[]): string {
  const calendar = ical({
    name: 'Lamplight',
    prodId: { company: 'Lamplight', product: 'Reading journal', language: 'EN' },
    // How often calendar apps should fetch again (REFRESH-INTERVAL, RFC 7986 §5.7).
    ttl: 6 * 60 * 60,
  });
  const sorted = [...events].sort((a, b) => (a.date < b.date ? -1 : a.date > b.date ? 1 : a.uid < b.uid ? -1 : 1));
  for (const event of sorted) {
    const start = utcMidnight(event.date);
    calendar.createEvent({
      id: event.uid,
      allDay: true,
      start,
      end: new Date(start.getTime() + DAY_MS),
      summary: event.summary,
      description: event.description ?? null,
      sequence: event.sequence,
      stamp: event.changedAt,
    });
  }
  // §3.1 and §3.4: every content line ends in CRLF, END:VCALENDAR too; ical-generator leaves the last one off.
  return `${calendar.toString()}\r\n`;
}
