import { Router } from 'express';
import type { DataSource } from 'typeorm';

import { AppError } from '../errors';
import { readUnsubscribeToken } from '../reminders/unsubscribe-token';

const page = (title: string, body: string) =>
  `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1"><title>${title} · Lamplight</title></head><body><main><h1>${title}</h1>${body}</main></body></html>`;

/**
 * `/api/reminders/unsubscribe?token=…`, from a reminder mail, without signing in. GET shows a
 * button (link checkers that open every link must not unsubscribe anyone); POST stops the
 * mails — also what a mail app's one-click unsubscribe sends (RFC 8058). The reader turning
 * reminders on again in Settings starts them again.
 */
export function remindersRoutes(dataSource: DataSource, serverSecret: Uint8Array): Router {
  const router = Router();
  const readerOf = (token: unknown) => {
    const userId = typeof token === 'string' ? readUnsubscribeToken(token, serverSecret) : null;
    if (!userId) throw new AppError(400, 'invalid_token', 'token: this unsubscribe link is not valid (copy the whole link from the e-mail)');
    return userId;
  };

  router.get('/unsubscribe', (req, res) => {
    readerOf(req.query['token']);
    const token = encodeURIComponent(String(req.query['token']));
    res
      .type('html')
      .send(
        page(
          'Stop loan reminders',
          `<p>Stop the e-mails about your loans? You can turn them on again in Settings.</p><form method="post" action="/api/reminders/unsubscribe?token=${token}"><button type="submit">Stop loan reminders</button></form>`,
        ),
      );
  });

  router.post('/unsubscribe', async (req, res) => {
    const userId = readerOf(req.query['token']);
    await dataSource.query(
      `INSERT INTO loan_reminder_stops (user_id, stopped_at) SELECT id, now() FROM users WHERE id = $1
       ON CONFLICT (user_id) DO UPDATE SET stopped_at = now()`,
      [userId],
    );
    res.type('html').send(page('Loan reminders stopped', '<p>You will get no more loan reminders. You can turn them on again in Settings.</p>'));
  });
  return router;
}
