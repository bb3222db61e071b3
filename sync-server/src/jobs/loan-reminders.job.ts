import type { EntityManager } from 'typeorm';

import { localDay } from '../../../shared/calendar/local-day';
import { remindersDue } from '../../../shared/loans/reminders';
import type { Loan } from '../../../shared/sync/schema/collections';
import { reminderMail, type ReminderLine } from '../reminders/reminder-mail';
import { unsubscribeToken } from '../reminders/unsubscribe-token';
import type { Job, JobServices } from './job';

/** Reminders go out from this local hour on, not in the night. */
const FIRST_HOUR = 8;

interface Reader {
  user_id: string;
  email: string;
  days_before: number | null;
  hold_ready: boolean | null;
  lent_overdue: boolean | null;
  digest: boolean | null;
  time_zone: string;
  /** The reader's chosen date locale (readerSettings), for the dates in the mail. */
  date_locale: string | null;
}

/** The reader's local day and hour, or null for a zone this server does not know. */
function localNow(now: Date, timeZone: string): { day: string; hour: number } | null {
  try {
    const hour = Number(new Intl.DateTimeFormat('en-GB', { timeZone, hour: '2-digit', hourCycle: 'h23' }).format(now));
    return { day: localDay(now.toISOString(), timeZone), hour };
  } catch {
    return null;
  }
}

/** Claims keys not claimed before; answers the ones this call claimed (a second instance's claim waits on ours, then finds it). */
async function claim(manager: EntityManager, userId: string, keys: readonly string[]): Promise<Set<string>> {
  const rows: { reminder_key: string }[] = await manager.query(
    `INSERT INTO loan_reminders_sent (user_id, reminder_key) SELECT $1, unnest($2::text[]) ON CONFLICT DO NOTHING RETURNING reminder_key`,
    [userId, keys],
  );
  return new Set(rows.map((row) => row.reminder_key));
}

/** Rolls a reader's transaction back without an error to report (a digest already sent today). */
class NothingToSend extends Error {}

async function remindReader(manager: EntityManager, reader: Reader, services: JobServices): Promise<number> {
  const local = localNow(services.now(), reader.time_zone);
  if (!local || local.hour < FIRST_HOUR) return 0;
  const loans: Loan[] = await manager.query(
    `SELECT id, kind, book_id AS "bookId", due_on AS "dueOn", returned_on AS "returnedOn", ready_on AS "readyOn",
            pick_up_by AS "pickUpBy", hold_outcome AS "holdOutcome"
       FROM loans WHERE user_id = $1 AND deleted IS NOT TRUE`,
    [reader.user_id],
  );
  const settings = { daysBefore: reader.days_before, holdReady: reader.hold_ready, lentOverdue: reader.lent_overdue };
  const due = remindersDue(loans, settings, local.day);
  if (due.length === 0) return 0;
  const claimed = await claim(
    manager,
    reader.user_id,
    due.map((item) => item.key),
  );
  const fresh = due.filter((item) => claimed.has(item.key));
  if (fresh.length === 0) return 0;
  if (reader.digest && (await claim(manager, reader.user_id, [`digest:${local.day}`])).size === 0) throw new NothingToSend();

  const titles = new Map<string, string | null>(
    (
      (await manager.query('SELECT id, title FROM books WHERE user_id = $1 AND id = ANY($2::uuid[])', [
        reader.user_id,
        fresh.flatMap((item) => (item.bookId ? [item.bookId] : [])),
      ])) as { id: string; title: string | null }[]
    ).map((row) => [row.id, row.title]),
  );
  const lines: ReminderLine[] = fresh.map((item) => ({ ...item, title: item.bookId ? (titles.get(item.bookId) ?? null) : null }));
  const unsubscribe = `${services.publicUrl}/api/reminders/unsubscribe?token=${unsubscribeToken(reader.user_id, services.serverSecret)}`;
  const mails = reader.digest ? [lines] : lines.map((line) => [line]);
  // Sent inside the transaction that claims the keys: a failed send rolls the claims back and the next run tries again.
  for (const group of mails) await services.mailer.send(reminderMail(reader.email, group, unsubscribe, services.publicUrl, reader.date_locale ?? undefined));
  return mails.length;
}

/**
 * Loan reminders by e-mail, every 15 minutes: for each reader who turned them on (and has not
 * unsubscribed since), what is due on their local day (`remindersDue`), each item once — the
 * keys in `loan_reminders_sent` are claimed in the same transaction that sends, so two instances
 * (or a retried run) never send one twice. Only verified addresses get mail.
 */
export const loanReminders: Job = {
  name: 'loan-reminders',
  cron: '*/15 * * * *',
  async run({ dataSource, services }) {
    if (!services) throw new Error('loan-reminders needs the job services (mailer, clock)');
    const readers: Reader[] = await dataSource.query(
      `SELECT r.user_id, u.email, r.days_before, r.hold_ready, r.lent_overdue, r.digest, r.time_zone,
              (SELECT rs.date_locale FROM reader_settings rs WHERE rs.user_id = r.user_id AND rs.deleted IS NOT TRUE LIMIT 1) AS date_locale
         FROM loan_reminders r JOIN users u ON u.id = r.user_id
        WHERE r.email IS TRUE AND r.deleted IS NOT TRUE AND r.time_zone IS NOT NULL AND u.email_verified_at IS NOT NULL
          AND NOT EXISTS (SELECT 1 FROM loan_reminder_stops s
                           WHERE s.user_id = r.user_id AND (r.email_since IS NULL OR s.stopped_at > r.email_since::timestamptz))`,
    );
    let failure: unknown = null;
    for (const reader of readers) {
      try {
        await dataSource.transaction((manager) => remindReader(manager, reader, services));
      } catch (error) {
        if (!(error instanceof NothingToSend)) failure ??= error;
      }
    }
    // Old claims go after 90 days: long past any loan's reminders.
    await dataSource.query(`DELETE FROM loan_reminders_sent WHERE sent_at < now() - interval '90 days'`);
    // One reader's failed send does not hold up the others; the run still fails, so pg-boss retries it.
    if (failure) throw failure;
  },
};
