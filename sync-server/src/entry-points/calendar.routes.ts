import { Router } from 'express';

import type { CalendarFeeds } from '../calendar/calendar-feeds';
import { AppError } from '../errors';
import { callerOf } from './require-auth';

/** A feed answer, found or not, leaves no sooner than this after the request came in. */
export const FEED_ANSWER_FLOOR_MS = 200;

const FEED_FILE = /^([A-Za-z0-9_-]{43})\.ics$/;

const waitUntil = (deadline: number) => new Promise((resolve) => setTimeout(resolve, Math.max(0, deadline - Date.now())));

/**
 * `GET /api/calendar/<secret>.ics`, for calendar apps (no sign-in: the secret is the key). A
 * wrong, replaced or revoked secret is a 404, and every answer waits to the same floor, so the
 * time taken does not tell a live secret from a dead one.
 */
export function calendarFeedRoutes(feeds: CalendarFeeds): Router {
  const router = Router();
  router.get('/:file', async (req, res) => {
    const deadline = Date.now() + FEED_ANSWER_FLOOR_MS;
    const secret = FEED_FILE.exec(req.params['file'] ?? '')?.[1];
    const body = secret ? await feeds.feed(secret) : null;
    await waitUntil(deadline);
    if (body === null) throw new AppError(404, 'not_found', 'No such calendar');
    res.type('text/calendar; charset=utf-8').setHeader('Content-Disposition', 'inline; filename="lamplight.ics"');
    res.send(body);
  });
  return router;
}

/** `/api/calendar-feed` (signed in): whether the feed is on; POST makes a new secret (the old stops); DELETE revokes. */
export function calendarSettingsRoutes(feeds: CalendarFeeds): Router {
  const router = Router();
  router.get('/', async (_req, res) => {
    res.json(await feeds.status(callerOf(res).userId));
  });
  router.post('/', async (_req, res) => {
    const secret = await feeds.regenerate(callerOf(res).userId);
    res.status(201).json({ path: `/api/calendar/${secret}.ics` });
  });
  router.delete('/', async (_req, res) => {
    await feeds.revoke(callerOf(res).userId);
    res.status(204).end();
  });
  return router;
}
