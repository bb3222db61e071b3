import { Router } from 'express';

import { adminUserQuery, adminUserUpdateInput } from '../../../shared/api/admin';
import type { AdminUsers } from '../domain/admin-users';
import { emptyCaughtMail, readCaughtMail } from '../mail/caught-mail';
import { AppError } from '../errors';
import { parseInput, uuidParam } from './parse-input';
import { callerOf } from './require-auth';

/** `/api/admin` (behind requireAuth and requireAdmin). */
export function adminRoutes(adminUsers: AdminUsers, devMailDir: string | null): Router {
  const router = Router();
  router.param('id', uuidParam('No such account'));

  /** `?q=words&page=0&size=50`: a page of accounts and how many match. */
  router.get('/users', async (req, res) => {
    const { q, page, size } = parseInput(adminUserQuery, req.query);
    res.json(await adminUsers.page(q, page, size));
  });

  router.patch('/users/:id', async (req, res) => {
    const change = parseInput(adminUserUpdateInput, req.body);
    res.json(await adminUsers.update(callerOf(res).userId, req.params['id']!, change));
  });

  /** Development only: what the local inbox caught, so a newcomer can follow a reset link. */
  router.get('/mail', async (_req, res) => {
    if (!devMailDir) throw new AppError(404, 'not_found', 'The mail inbox exists only in development');
    res.json(await readCaughtMail(devMailDir));
  });

  /** Development only: empties the local inbox. */
  router.delete('/mail', async (_req, res) => {
    if (!devMailDir) throw new AppError(404, 'not_found', 'The mail inbox exists only in development');
    res.json({ removed: await emptyCaughtMail(devMailDir) });
  });

  return router;
}
