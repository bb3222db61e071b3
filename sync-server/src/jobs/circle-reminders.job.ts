import type { DataSource } from 'typeorm';

import { meetingsOf } from '../circles/circle-meetings';
import { meetingReminderMail } from '../circles/circle-mail';
import type { Mailer } from '../mail/mailer';
import type { Job } from './job';

/** The UTC calendar day after `now`, YYYY-MM-DD. */
export const dayAfter = (now: Date): string => new Date(now.getTime() + 86_400_000).toISOString().slice(0, 10);

/**
 * Mails each member of a circle the day before a meeting (a part with a date), unless they
 * answered "not going". Runs hourly; `circle_reminders_sent` makes each reminder go once, even
 * when a run is retried or a meeting is moved to tomorrow later in the day.
 */
export function circleReminders(mailer: Mailer, publicUrl: string, now: () => Date = () => new Date()): Job {
  return {
    name: 'circle-reminders',
    cron: '5 * * * *',
    async run({ dataSource }) {
      await sendReminders(dataSource, mailer, publicUrl, dayAfter(now()));
    },
  };
}

export async function sendReminders(dataSource: DataSource, mailer: Mailer, publicUrl: string, day: string): Promise<number> {
  let sent = 0;
  for (const meeting of await meetingsOf(dataSource.manager, { day })) {
    const [recipient] = (await dataSource.query(
      `SELECT u.email FROM users u
        WHERE u.id = $1 AND u.disabled_at IS NULL
          AND NOT EXISTS (SELECT 1 FROM circle_reminders_sent s WHERE s.part_id = $2 AND s.user_id = $1)
          AND NOT EXISTS (SELECT 1 FROM circle_rows r WHERE r.collection = 'circleRsvps' AND r.circle_id = $3 AND r.author_id = $1
                             AND r.fields->>'partId' = $2::text AND r.fields->>'answer' = 'notGoing')`,
      [meeting.userId, meeting.partId, meeting.circleId],
    )) as { email: string }[];
    if (!recipient) continue;
    // Claimed before sending: a failed send is not retried (better one reminder lost than two sent).
    const claimed = (await dataSource.query('INSERT INTO circle_reminders_sent (part_id, user_id) VALUES ($1, $2) ON CONFLICT DO NOTHING RETURNING 1', [
      meeting.partId,
      meeting.userId,
    ])) as unknown[];
    if (claimed.length === 0) continue;
    await mailer.send(meetingReminderMail(recipient.email, meeting, `${publicUrl}/circles/${meeting.circleId}`));
    sent++;
  }
  return sent;
}
