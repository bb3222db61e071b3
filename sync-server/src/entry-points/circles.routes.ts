import express, { Router } from 'express';
import * as z from 'zod';

import type { CirclePullResponse } from '../../../shared/circles/circle-wire';
import { validateCircleChange } from '../../../shared/circles/validate-circle-change';
import type { FieldChange, PushResponse } from '../../../shared/api/sync';
import { MAX_PUSH_BYTES } from '../../../shared/api/sync';
import type { CircleInvitations } from '../circles/circle-invitations';
import type { CircleMembership } from '../circles/circle-membership';
import type { CircleSyncStore } from '../circles/circle-sync-store';
import { AppError } from '../errors';
import { parseInput, uuidParam } from './parse-input';
import { PullCursors } from './pull-cursor';
import { callerOf } from './require-auth';

const circleInput = z.object({
  name: z.string({ error: 'Give the circle a name' }).trim().min(1, 'Give the circle a name').max(120, 'Keep the name to 120 characters'),
  description: z.string().trim().max(1000, 'Keep the description to 1000 characters').nullish(),
});
const codeInput = z.object({ code: z.string({ error: 'Enter the join code' }).max(40, 'A join code is 10 letters and digits') });
const tokenInput = z.object({ token: z.string({ error: 'The invitation link is incomplete' }).min(1).max(2000) });
const inviteInput = z.object({
  email: z
    .email('Enter an e-mail address like name@example.com')
    .max(254)
    .transform((email) => email.toLowerCase()),
});
const handOverInput = z.object({ userId: z.uuid('Choose a member'), stayHost: z.boolean().default(false) });
const pushInput = z.object({ changes: z.array(z.unknown(), { error: 'changes must be a list' }).max(500, 'Send at most 500 changes in one push') });
const pullQuery = z.object({
  since: z.string().max(100).optional(),
  limit: z.coerce.number().int().min(1, 'limit must be 1 to 2000').max(2000, 'limit must be 1 to 2000').default(500),
});

/**
 * `/api/circles` (signed in). Every route under `/:circleId` checks membership first and answers
 * 403 `not_a_member` for a circle the caller is not in, whether it exists or not.
 */
export function circlesRoutes(deps: {
  membership: CircleMembership;
  invitations: CircleInvitations;
  store: CircleSyncStore;
  serverSecret: Uint8Array;
  inviteLimiter: express.RequestHandler;
}): Router {
  const { membership, invitations, store } = deps;
  const router = Router();
  const cursors = new PullCursors(deps.serverSecret);
  router.param('circleId', uuidParam('No such circle'));
  router.param('userId', uuidParam('No such member'));

  router.get('/', async (_req, res) => {
    res.json({ circles: await membership.list(callerOf(res).userId) });
  });
  router.post('/', async (req, res) => {
    const { name, description } = parseInput(circleInput, req.body);
    res.status(201).json(await membership.create(callerOf(res).userId, name, description ?? null));
  });
  router.post('/join', async (req, res) => {
    const { code } = parseInput(codeInput, req.body);
    res.json(await membership.joinByCode(callerOf(res).userId, code));
  });
  router.post('/invitations/accept', async (req, res) => {
    const { token } = parseInput(tokenInput, req.body);
    res.json(await invitations.accept(callerOf(res).userId, token));
  });

  router.get('/:circleId', async (req, res) => {
    res.json(await membership.details(String(req.params['circleId']), callerOf(res).userId));
  });
  router.post('/:circleId/invitations', deps.inviteLimiter, async (req, res) => {
    const { email } = parseInput(inviteInput, req.body);
    await invitations.invite(String(req.params['circleId']), callerOf(res).userId, email);
    res.status(202).json({ sent: true });
  });
  router.post('/:circleId/join-code', async (req, res) => {
    res.json(await membership.rotateJoinCode(String(req.params['circleId']), callerOf(res).userId));
  });
  router.delete('/:circleId/members/:userId', async (req, res) => {
    await membership.remove(String(req.params['circleId']), callerOf(res).userId, String(req.params['userId']));
    res.status(204).end();
  });
  router.post('/:circleId/hosts', async (req, res) => {
    const { userId, stayHost } = parseInput(handOverInput, req.body);
    await membership.handOver(String(req.params['circleId']), callerOf(res).userId, userId, stayHost);
    res.status(204).end();
  });
  router.post('/:circleId/leave', async (req, res) => {
    await membership.leave(String(req.params['circleId']), callerOf(res).userId);
    res.status(204).end();
  });

  router.post('/:circleId/sync/push', express.json({ limit: MAX_PUSH_BYTES }), async (req, res) => {
    const { changes } = parseInput(pushInput, req.body);
    const now = Date.now();
    const problems = changes.map((change, index) => validateCircleChange(change, index, now)).filter((problem) => problem !== null);
    if (problems.length > 0) {
      const onlyClock = problems.every((problem) => problem.code === 'clock_ahead');
      throw new AppError(400, onlyClock ? 'clock_ahead' : 'invalid_changes', `${problems.length} of ${changes.length} changes cannot be applied`, problems);
    }
    const result = await store.push(String(req.params['circleId']), callerOf(res).userId, changes as FieldChange[]);
    const body: PushResponse = { ...result, serverTime: new Date().toISOString() };
    res.json(body);
  });

  router.get('/:circleId/sync/pull', async (req, res) => {
    const { since, limit } = parseInput(pullQuery, req.query);
    const circleId = String(req.params['circleId']);
    const { userId } = callerOf(res);
    // Sealed for this reader and this circle: a cursor of one circle does not open in another.
    const audience = `${userId}/${circleId}`;
    const sinceSeq = since ? cursors.open(audience, since) : 0;
    if (sinceSeq === null) throw new AppError(400, 'invalid_input', 'Some fields need attention', { since: 'is not a cursor this server issued for this circle' });
    const page = await store.pull(circleId, userId, sinceSeq, limit);
    const body: CirclePullResponse = {
      rows: page.rows,
      cursor: cursors.seal(audience, page.lastSeq),
      hasMore: page.hasMore,
      members: await membership.members(circleId),
      role: page.role,
      serverTime: new Date().toISOString(),
    };
    res.json(body);
  });

  return router;
}
