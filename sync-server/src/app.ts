import express, { type Express } from 'express';
import type { DataSource } from 'typeorm';

import type { ServerConfig } from './config';
import { Accounts } from './domain/accounts';
import { AdminUsers } from './domain/admin-users';
import { DeviceSessions } from './domain/device-sessions';
import type { Mailer } from './mail/mailer';
import { PasswordResets } from './domain/password-resets';
import { Uploads } from './domain/uploads';
import { adminRoutes } from './entry-points/admin.routes';
import { authRoutes } from './entry-points/auth.routes';
import { devicesRoutes } from './entry-points/devices.routes';
import { syncRoutes } from './entry-points/sync.routes';
import { uploadsRoutes } from './entry-points/uploads.routes';
import { PostgresAttemptStore } from './data-access/attempt-store';
import { SyncStore } from './data-access/sync-store';
import { UploadStore } from './data-access/upload-store';
import { healthRoutes } from './entry-points/health.routes';
import { requireAdmin, requireAuth } from './entry-points/require-auth';
import { attemptLimiter, securityHeaders } from './entry-points/security';
import { staticApp } from './entry-points/static-app';
import { apiNotFound, errorHandler } from './errors';

export interface AppDependencies {
  readonly config: ServerConfig;
  readonly dataSource: DataSource;
  readonly mailer: Mailer;
}

/**
 * Builds the Express app without listening, so specs can run it in-process. CORS stays closed:
 * the app and the API share one origin, so no Access-Control-* headers are ever sent.
 */
export function createApp({ config, dataSource, mailer }: AppDependencies): Express {
  const sessions = new DeviceSessions(dataSource, config.jwtSecret);
  const accounts = new Accounts(dataSource, config, sessions, mailer);
  const resets = new PasswordResets(dataSource, config, sessions, mailer);
  const authenticated = requireAuth(dataSource, config.jwtSecret);

  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', 'loopback');
  app.use(securityHeaders());

  app.use('/api', express.json({ limit: '64kb' }));
  app.use('/api/health', healthRoutes(dataSource));
  app.use(
    '/api/auth',
    authRoutes({ accounts, sessions, resets, attemptLimiter: attemptLimiter(config.authRateLimit, new PostgresAttemptStore(dataSource)), requireAuth: authenticated }),
  );
  // Everything else under /api needs a signed-in caller.
  app.use('/api', authenticated);
  app.use('/api/devices', devicesRoutes(sessions));
  app.use('/api/sync', syncRoutes(new SyncStore(dataSource)));
  app.use('/api/uploads', uploadsRoutes(new Uploads(new UploadStore(dataSource)), config.uploadMaxBytes));
  app.use('/api/admin', requireAdmin, adminRoutes(new AdminUsers(dataSource), config.devMailDir));
  app.use('/api', apiNotFound);

  if (config.appDir) app.use(staticApp(config.appDir));

  app.use(errorHandler);
  return app;
}
