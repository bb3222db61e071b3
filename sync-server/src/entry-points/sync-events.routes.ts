import { Router, type Request, type Response } from 'express';
import { decodeJwt } from 'jose';
import type { DataSource } from 'typeorm';

import type { SyncListener } from '../data-access/sync-listener';
import { latestSeq } from '../data-access/sync-notifications';
import { AppError } from '../errors';
import { PullCursors } from './pull-cursor';
import { callerOf } from './require-auth';

/** A reader rarely has more than a few tabs and devices open; past this, a stream is refused. */
export const MAX_STREAMS_PER_READER = 20;
/** Clients (and EventSource) wait this long before reconnecting after the stream ends. */
const RETRY_MS = 3000;

export interface SyncEventsOptions {
  /** A comment line this often keeps proxies and NATs from closing an idle stream. */
  readonly heartbeatMs: number;
}

/**
 * `GET /api/sync/events` (behind requireAuth): a Server-Sent Events stream that pokes the device
 * to pull whenever any device of the same reader pushed, through any server instance.
 *
 * Authentication is the ordinary `Authorization: Bearer` header: the app reads the stream with
 * `fetch`, not `EventSource` (which cannot send headers), so no token ever sits in a URL (where
 * proxies and logs keep it) and no ticket needs storing for whichever instance the load balancer
 * picks. The stream ends when the access token expires; the client reconnects with a fresh one,
 * so a revoked device loses its stream within one token lifetime.
 *
 * Events: `event: sync`, `id:` the sealed sequence the poke announces (opaque), `data: {}`. On
 * connect the current sequence is sent unless `Last-Event-ID` shows the device saw it already.
 */
export function syncEventsRoutes(dataSource: DataSource, listener: SyncListener, options: SyncEventsOptions, serverSecret: Uint8Array): Router {
  const router = Router();
  // Event ids are sealed like pull cursors: the sequence is server-wide and would tell how much others write.
  const cursors = new PullCursors(serverSecret);

  router.get('/', async (req: Request, res: Response) => {
    const { userId } = callerOf(res);
    if (listener.streamsOf(userId) >= MAX_STREAMS_PER_READER) {
      throw new AppError(429, 'too_many_streams', `At most ${MAX_STREAMS_PER_READER} live streams per reader; close one first`);
    }
    const lastEventId = parseLastEventId(cursors, userId, req.get('last-event-id'));
    let lastSent = lastEventId ?? -1;
    let open = true;
    let sending = Promise.resolve();

    // A poke with no sequence (after the listener reconnected) reads the latest one itself.
    const poke = (seq: number | null) => {
      sending = sending.then(async () => {
        const next = seq ?? (await latestSeq(dataSource, userId).catch(() => null));
        if (!open || next === null || next <= lastSent) return;
        lastSent = next;
        res.write(`event: sync\nid: ${cursors.seal(userId, next)}\ndata: {}\n\n`);
      });
    };

    let unsubscribe: () => void;
    try {
      unsubscribe = await listener.subscribe(userId, poke);
    } catch {
      throw new AppError(503, 'unavailable', 'Live updates are unavailable right now; sync still works');
    }
    if (req.socket.destroyed) {
      unsubscribe(); // the device went away while we subscribed: 'close' has fired already
      return;
    }
    res.status(200).set({
      'Content-Type': 'text/event-stream; charset=utf-8',
      // no-transform: proxies and compression middleware leave the stream alone.
      'Cache-Control': 'no-cache, no-store, no-transform',
      // nginx would otherwise buffer the response and hold pokes back.
      'X-Accel-Buffering': 'no',
      Connection: 'keep-alive',
    });
    res.flushHeaders();
    res.socket?.setNoDelay(true);
    res.write(`retry: ${RETRY_MS}\n\n`);

    const heartbeat = setInterval(() => res.write(`: heartbeat ${new Date().toISOString()}\n\n`), options.heartbeatMs);
    const expiry = setTimeout(() => res.end(), msUntilTokenExpiry(req));
    const finish = () => {
      if (!open) return;
      open = false;
      clearInterval(heartbeat);
      clearTimeout(expiry);
      unsubscribe();
    };
    res.on('close', finish);
    res.on('error', finish);

    // LISTEN is active now: whatever committed before is covered by this read, after it by pokes.
    poke(null);
  });

  return router;
}

/** `Last-Event-ID` opened to a sequence; anything else counts as absent (a fresh start, never an error). */
function parseLastEventId(cursors: PullCursors, userId: string, header: string | undefined): number | undefined {
  return (header === undefined ? null : cursors.open(userId, header.trim())) ?? undefined;
}

/** requireAuth has verified the token already; its `exp` says how long this stream may live. */
function msUntilTokenExpiry(req: Request): number {
  const token = /^Bearer (.+)$/.exec(req.get('authorization') ?? '')?.[1];
  const exp = token ? decodeJwt(token).exp : undefined;
  return exp === undefined ? 0 : Math.max(0, exp * 1000 - Date.now());
}
