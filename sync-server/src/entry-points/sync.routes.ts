import express, { Router, type Response } from 'express';
import * as z from 'zod';

import { MAX_PULL_LIMIT, MAX_PUSH_BYTES, MAX_PUSH_CHANGES, type FieldChange, type PullResponse, type PushResponse } from '../../../shared/api/sync';
import { validateChange } from '../../../shared/sync/validate-change';
import type { SyncStore } from '../data-access/sync-store';
import { TextChangesRefused } from '../data-access/text-store';
import { AppError } from '../errors';
import { parseInput } from './parse-input';
import { PullCursors } from './pull-cursor';
import { callerOf } from './require-auth';

const pushEnvelope = z.object({
  deviceId: z.string({ error: 'deviceId is required' }).min(1, 'deviceId is required').max(64, 'deviceId is too long'),
  // Each change is checked by validateChange (naming its index); zod only checks that this is a list (z.array copied all 1,000).
  changes: z.custom<unknown[]>((value) => Array.isArray(value), { error: 'changes must be a list' }),
});

const pullQuery = z.object({
  since: z.string().max(100).optional(),
  limit: z.coerce.number().int('limit must be a whole number').min(1, 'limit must be 1 to 5000').max(MAX_PULL_LIMIT, 'limit must be 1 to 5000').default(1000),
});

/** Pulls one reader may run at once on one instance: a page can be 2 MiB of JSON to build. */
export const MAX_CONCURRENT_PULLS = 2;

/**
 * PostgreSQL's data exceptions (SQLSTATE class 22: invalid text, untranslatable characters,
 * numbers out of range) and program limits (class 54) are the input's fault, not the server's:
 * answer 400 or 413 without per-change details, so a device halves the batch to find the change.
 * The shared validator refuses the known cases first, naming the field.
 */
async function refusingBadData<T>(work: () => Promise<T>): Promise<T> {
  try {
    return await work();
  } catch (error) {
    const code = (error as { code?: unknown }).code;
    if (typeof code === 'string' && code.startsWith('22')) throw new AppError(400, 'unstorable', 'The database cannot store one of these values', []);
    if (typeof code === 'string' && code.startsWith('54')) throw new AppError(413, 'too_large', 'One of these values is too large to store');
    throw error;
  }
}

/**
 * Sends JSON that is already UTF-8: `res.json` would serialise it again and `res.send` would hash
 * it for an ETag, which answers marked `no-store` never use.
 */
function sendJsonBytes(res: Response, bytes: Buffer): void {
  res.setHeader('Content-Type', 'application/json; charset=utf-8');
  res.setHeader('Content-Length', bytes.length);
  res.end(bytes);
}

/** `/api/sync` (behind requireAuth): push field changes, pull winning values. */
export function syncRoutes(store: SyncStore, serverSecret: Uint8Array): Router {
  const router = Router();
  const cursors = new PullCursors(serverSecret);
  const pullsInFlight = new Map<string, number>();
  router.use(express.json({ limit: MAX_PUSH_BYTES }));

  router.post('/push', async (req, res) => {
    const { changes } = parseInput(pushEnvelope, req.body);
    if (changes.length > MAX_PUSH_CHANGES) {
      throw new AppError(413, 'too_large', `Send at most ${MAX_PUSH_CHANGES} changes in one push`);
    }
    const now = Date.now();
    const problems = changes.map((change, index) => validateChange(change, index, now)).filter((p) => p !== null);
    if (problems.length > 0) {
      // Nothing of a batch with a bad change is applied; the client sets the bad ones aside and re-sends the rest.
      const onlyClock = problems.every((problem) => problem.code === 'clock_ahead');
      throw new AppError(400, onlyClock ? 'clock_ahead' : 'invalid_changes', `${problems.length} of ${changes.length} changes cannot be applied`, problems);
    }
    const result = await refusingBadData(() => store.push(callerOf(res).userId, changes as FieldChange[])).catch((error: unknown) => {
      // A text update that does not fit its stored text: refused like any invalid change.
      if (error instanceof TextChangesRefused) {
        throw new AppError(400, 'invalid_changes', `${error.problems.length} of ${changes.length} changes cannot be applied`, error.problems);
      }
      throw error;
    });
    const body: PushResponse = { ...result, serverTime: new Date().toISOString() };
    res.json(body);
  });

  router.get('/pull', async (req, res) => {
    const { since, limit } = parseInput(pullQuery, req.query);
    const { userId } = callerOf(res);
    const sinceSeq = since ? cursors.open(userId, since) : 0;
    if (sinceSeq === null) throw new AppError(400, 'invalid_input', 'Some fields need attention', { since: 'is not a cursor this server issued' });
    const running = pullsInFlight.get(userId) ?? 0;
    if (running >= MAX_CONCURRENT_PULLS) {
      res.setHeader('Retry-After', '1');
      throw new AppError(429, 'too_many_pulls', `At most ${MAX_CONCURRENT_PULLS} pulls at once; try again in a moment`);
    }
    pullsInFlight.set(userId, running + 1);
    try {
      const page = await store.pull(userId, sinceSeq, limit);
      // The changes as the store already serialised them (a page is up to 2 MiB of JSON), then the rest of the answer.
      const rest: Omit<PullResponse, 'changes'> = {
        // Nothing new: the device's own cursor still says where it is (no sealing on the hot path).
        cursor: since && page.lastSeq === sinceSeq && cursors.isCurrent(since) ? since : cursors.seal(userId, page.lastSeq),
        hasMore: page.hasMore,
        ...(page.remaining === undefined ? {} : { remaining: page.remaining }),
        serverTime: new Date().toISOString(),
      };
      sendJsonBytes(res, Buffer.concat([Buffer.from('{"changes":'), page.changesBytes, Buffer.from(`,${JSON.stringify(rest).slice(1)}`)]));
    } finally {
      const left = (pullsInFlight.get(userId) ?? 1) - 1;
      if (left > 0) pullsInFlight.set(userId, left);
      else pullsInFlight.delete(userId);
    }
  });

  return router;
}
