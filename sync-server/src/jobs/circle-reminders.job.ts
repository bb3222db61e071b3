import type { DataSource } from 'typeorm';

import { candidateMeetingDays, meetingReminderDue, reminderZone } from '../../../shared/circles/meeting-reminder';
import { meetingsOf } from '../circles/circle-meetings';
import { meetingReminderMail } from '../circles/circle-mail';
import type { Mailer } from '../mail/mailer';
import type { Job } from './job';

/**
 * Mails each member of a circle the day before a meeting (a part with a date) in the member's own
 * time zone, from the morning on, unless they answered "not going". The zone is the one their
 * device keeps in their circle settings (`circleProgress.timeZone`), else their loan reminders',
 * else UTC. Runs hourly; `circle_reminders_sent` makes each reminder go once, even when a run is
 * retried or a meeting is moved to tomorrow later in the day.
 */
export function circleReminders(mailer: Mailer, publicUrl: string, now: () => Date = () => new Date()): Job {
  return {
    name: 'circle-reminders',
    cron: '5 * * * *',
    async run({ dataSource }) {
      await sendReminders(dataSource, mailer, publicUrl, now());
    },
  };
}

export async function sendReminders(dataSource: DataSource, mailer: Mailer, publicUrl: string, now: Date): Promise<number> {
  let sent = 0;
  for (const meeting of await meetingsOf(dataSource.manager, { days: candidateMeetingDays(now) })) {
    const [recipient] = (await dataSource.query(
      `SELECT u.email,
              (SELECT p.fields->>'timeZone' FROM circle_rows p
                WHERE p.collection = 'circleProgress' AND p.circle_id = $3 AND p.author_id = $1
                ORDER BY p.seq DESC LIMIT 1) AS circle_zone,
              (SELECT l.time_zone FROM loan_reminders l WHERE l.user_id = $1 AND l.deleted IS NOT TRUE LIMIT 1) AS loan_zone
         FROM users u
        WHERE u.id = $1 AND u.disabled_at IS NULL
          AND NOT EXISTS (SELECT 1 FROM circle_reminders_sent s WHERE s.part_id = $2 AND s.user_id = $1)
          AND NOT EXISTS (SELECT 1 FROM circle_rows r WHERE r.collection = 'circleRsvps' AND r.circle_id = $3 AND r.author_id = $1
                             AND r.fields->>'partId' = $2::text AND r.fields->>'answer' = 'notGoing')`,
      [meeting.userId, meeting.partId, meeting.circleId],
    )) as { email: string; circle_zone: string | null; loan_zone: string | null }[];
    if (!recipient || !meetingReminderDue(meeting.day, now, reminderZone(recipient.circle_zone, recipient.loan_zone))) continue;
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
