import type { EntityManager } from 'typeorm';

import type { CalendarEvent } from './calendar-event';
import { clockSequence } from './clock-sequence';

interface DatedRow {
  id: string;
  kind: string | null;
  day: string;
  title: string | null;
  clocks: Record<string, string>;
  book_clocks: Record<string, string> | null;
}

const SUMMARY: Record<string, string> = {
  library: 'Due back at the library',
  borrowed: 'Due back to a friend',
  lentOut: 'Expected back from a friend',
  hold: 'Last day to pick up a hold',
};

/**
 * Open loans' due dates, ready holds' pick-up-by days and lent books' expected returns, one
 * all-day event each, titled by the book. A friend's name and a library card never go in.
 */
export async function loanEvents(userId: string, manager: EntityManager): Promise<CalendarEvent[]> {
  const rows: DatedRow[] = await manager.query(
    `SELECT l.id, l.kind, CASE WHEN l.kind = 'hold' THEN l.pick_up_by ELSE l.due_on END AS day,
            b.title, l.clocks, b.clocks AS book_clocks
       FROM loans l LEFT JOIN books b ON b.user_id = l.user_id AND b.id = l.book_id AND b.deleted IS NOT TRUE
      WHERE l.user_id = $1 AND l.deleted IS NOT TRUE
        AND CASE WHEN l.kind = 'hold' THEN l.pick_up_by IS NOT NULL AND l.hold_outcome IS NULL
                 ELSE l.due_on IS NOT NULL AND l.returned_on IS NULL END`,
    [userId],
  );
  return rows.map((row) => {
    const dateField = row.kind === 'hold' ? 'pickUpBy' : 'dueOn';
    return {
      // The UID names the loan, not the date: a renewal moves the event (RFC 5545 §3.8.4.7).
      uid: `loan-${row.id}@lamplight`,
      date: row.day,
      summary: `${SUMMARY[row.kind ?? 'library'] ?? SUMMARY['library']}: ${row.title ?? 'a book'}`,
      ...clockSequence([row.clocks[dateField], row.clocks['kind'], row.clocks['bookId'], row.book_clocks?.['title']]),
    };
  });
}

/** Release dates of wishlist books still ahead or recent (the last 30 days). */
export async function releaseEvents(userId: string, manager: EntityManager): Promise<CalendarEvent[]> {
  const rows: { id: string; title: string | null; release_date: string; clocks: Record<string, string> }[] = await manager.query(
    `SELECT id, title, release_date, clocks FROM books
      WHERE user_id = $1 AND deleted IS NOT TRUE AND release_date IS NOT NULL
        AND release_date >= to_char(now() - interval '30 days', 'YYYY-MM-DD')`,
    [userId],
  );
  return rows.map((row) => ({
    uid: `release-${row.id}@lamplight`,
    date: row.release_date,
    summary: `Out today: ${row.title ?? 'a book'}`,
    ...clockSequence([row.clocks['releaseDate'], row.clocks['title']]),
  }));
}
