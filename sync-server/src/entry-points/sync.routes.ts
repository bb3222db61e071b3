import express, { Router } from 'express';
import * as z from 'zod';

import {
  MAX_PULL_LIMIT,
  MAX_PUSH_BYTES,
  MAX_PUSH_CHANGES,
  type FieldChange,
  type PullResponse,
  type PushResponse,
} from '../../../shared/sync/field-change';
import { validateChange } from '../../../shared/sync/validate-change';
import type { SyncStore } from '../data-access/sync-store';
import { TextChangesRefused } from '../data-access/text-store';
import { AppError } from '../errors';
import { parseInput } from './parse-input';
import { callerOf } from './require-auth';

const pushEnvelope = z.object({
  deviceId: z.string({ error: 'deviceId is required' }).min(1, 'deviceId is required').max(64, 'deviceId is too long'),
  changes: z.array(z.unknown(), { error: 'changes must be a list' }),
});

const pullQuery = z.object({
  since: z.string().max(100).optional(),
  limit: z.coerce.number().int('limit must be a whole number').min(1, 'limit must be 1 to 5000').max(MAX_PULL_LIMIT, 'limit must be 1 to 5000').default(1000),
});

/** Cursors are opaque to clients: today a sequence number, versioned so it can change. */
const encodeCursor = (seq: number) => Buffer.from(`v1:${seq}`).toString('base64url');
function decodeCursor(cursor: string | undefined): number {
  if (cursor === undefined || cursor === '') return 0;
  const match = /^v1:(\d{1,18})$/.exec(Buffer.from(cursor, 'base64url').toString());
  if (!match) throw new AppError(400, 'invalid_input', 'Some fields need attention', { since: 'is not a cursor this server issued' });
  return Number(match[1]);
}

/** `/api/sync` (behind requireAuth): push field changes, pull winning values. */
export function syncRoutes(store: SyncStore): Router {
  const router = Router();
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
      throw new AppError(
        400,
        onlyClock ? 'clock_ahead' : 'invalid_changes',
        `${problems.length} of ${changes.length} changes cannot be applied`,
        problems,
      );
    }
    const result = await store.push(callerOf(res).userId, changes as FieldChange[]).catch((error: unknown) => {
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
    const sinceSeq = decodeCursor(since);
    const page = await store.pull(callerOf(res).userId, sinceSeq, limit);
    const body: PullResponse = {
      changes: page.changes,
      cursor: encodeCursor(page.lastSeq),
      hasMore: page.hasMore,
      serverTime: new Date().toISOString(),
    };
    res.json(body);
  });

  return router;
}
