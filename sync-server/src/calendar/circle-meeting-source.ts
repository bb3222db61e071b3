import { circleMeetingEvents } from '../circles/circle-meetings';
import type { CalendarEventSource } from './calendar-event';
import { clockSequence } from './clock-sequence';

/**
 * The reader's circle meetings, as all-day events on the meeting's day (a time, when the host set
 * one, goes in the description: the feed's events are all-day). Like loan events, DTSTAMP is the
 * last change of what the event shows and SEQUENCE grows with it (`clockSequence` over the part's
 * date, time, place, link and label, the circle's name and the pick's title), so a feed fetched
 * twice is the same and a moved meeting updates in place by its stable UID.
 */
export const circleMeetingSource: CalendarEventSource = async (userId, manager) => {
  return (await circleMeetingEvents(userId, manager)).map((event) => ({
    uid: event.uid,
    date: event.day ?? event.start!.slice(0, 10),
    summary: event.summary,
    description: [event.start ? `At ${event.start.slice(11)}.` : null, event.description].filter(Boolean).join('\n') || undefined,
    ...clockSequence(event.clocks),
  }));
};
