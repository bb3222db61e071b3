import { circleMeetingEvents } from '../circles/circle-meetings';
import type { CalendarEventSource } from './calendar-event';

/**
 * The reader's circle meetings, as all-day events on the meeting's day (a time, when the host set
 * one, goes in the description: the feed's events are all-day). SEQUENCE stays 0 and DTSTAMP is
 * the feed's time: circle rows are not per-reader, so their clocks are not read here; calendars
 * still move the event by its stable UID.
 */
export const circleMeetingSource: CalendarEventSource = async (userId, manager) => {
  const changedAt = new Date();
  return (await circleMeetingEvents(userId, manager)).map((event) => ({
    uid: event.uid,
    date: event.day ?? event.start!.slice(0, 10),
    summary: event.summary,
    description: [event.start ? `At ${event.start.slice(11)}.` : null, event.description].filter(Boolean).join('\n') || undefined,
    sequence: 0,
    changedAt,
  }));
};
