import { Router } from 'express';

import { renameDeviceInput, type DeviceSessionView } from '../../../shared/api/devices';
import type { DeviceSession } from '../data-access/entities/device-session.entity';
import type { DeviceSessions } from '../domain/device-sessions';
import { AppError } from '../errors';
import { parseInput, uuidParam } from './parse-input';
import { callerOf } from './require-auth';

function view(session: DeviceSession, currentSessionId: string): DeviceSessionView {
  return {
    id: session.id,
    name: session.name,
    createdAt: session.createdAt.toISOString(),
    lastSeenAt: session.lastSeenAt.toISOString(),
    current: session.id === currentSessionId,
  };
}

/** `/api/devices`: the reader's signed-in devices (behind requireAuth). */
export function devicesRoutes(sessions: DeviceSessions): Router {
  const router = Router();
  router.param('id', uuidParam('No such device'));

  router.get('/', async (_req, res) => {
    const caller = callerOf(res);
    res.json((await sessions.list(caller.userId)).map((session) => view(session, caller.sessionId)));
  });

  router.patch('/:id', async (req, res) => {
    const caller = callerOf(res);
    const { name } = parseInput(renameDeviceInput, req.body);
    const session = await sessions.rename(caller.userId, req.params['id']!, name);
    if (!session) throw new AppError(404, 'not_found', 'No such device');
    res.json(view(session, caller.sessionId));
  });

  /** Signs a device out (a lost tablet): its refresh tokens stop working at once. */
  router.delete('/:id', async (req, res) => {
    const caller = callerOf(res);
    if (!(await sessions.revoke(caller.userId, req.params['id']!))) throw new AppError(404, 'not_found', 'No such device');
    res.status(204).end();
  });

  return router;
}
