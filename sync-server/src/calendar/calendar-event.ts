import type { EntityManager } from 'typeorm';

/**
 * One all-day event of a reader's calendar feed, whatever made it. Nothing personal beyond a
 * book's title and the date goes in: no card numbers, friends' names or notes.
 */
export interface CalendarEvent {
  /** Stable across date changes (RFC 5545 §3.8.4.7): a calendar moves the event instead of adding one. */
  readonly uid: string;
  /** The reader's local day, 'YYYY-MM-DD'. */
  readonly date: string;
  readonly summary: string;
  readonly description?: string;
  /** Grows whenever the event changes (§3.8.7.4). */
  readonly sequence: number;
  /** When the event last changed (DTSTAMP, §3.8.7.2). */
  readonly changedAt: Date;
}

/**
 * Where a feed's events come from: loans today, circle meetings later. Each source reads the
 * reader's rows through `manager` (one transaction for the whole feed).
 */
export type CalendarEventSource = (userId: string, manager: EntityManager) => Promise<CalendarEvent[]>;
