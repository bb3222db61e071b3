import express, { type Express } from 'express';
import type { DataSource } from 'typeorm';

import type { ServerConfig } from './config';
import { Accounts } from './domain/accounts';
import { AdminUsers } from './domain/admin-users';
import { DeviceSessions } from './domain/device-sessions';
import { EmailVerification } from './domain/email-verification';
import type { Mailer } from './domain/mailer';
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
import { attemptLimiter, noStore, readerLimiter, securityHeaders } from './entry-points/security';
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
  const verification = new EmailVerification(dataSource, config, mailer);
  const accounts = new Accounts(dataSource, config, sessions, mailer, verification);
  const resets = new PasswordResets(dataSource, config, sessions, mailer);
  const authenticated = requireAuth(dataSource, config.jwtSecret);

  const app = express();
  app.disable('x-powered-by');
  // X-Forwarded-For is believed only from the proxies named in LAMPLIGHT_TRUST_PROXY (none by default).
  app.set('trust proxy', config.trustProxy.length > 0 ? [...config.trustProxy] : false);
  app.use(securityHeaders());

  app.use('/api', noStore);
  app.use('/api', express.json({ limit: '64kb' }));
  app.use('/api/health', healthRoutes(dataSource));
  app.use(
    '/api/auth',
    authRoutes({
      accounts,
      sessions,
      resets,
      verification,
      attemptLimiter: attemptLimiter(config.authRateLimit, new PostgresAttemptStore(dataSource)),
      // Three fresh confirmation links an hour per reader: enough for a lost mail, useless for spam.
      verifyMailLimiter: readerLimiter('confirmation e-mail', 3, 3600_000, new PostgresAttemptStore(dataSource, 'verify-mail')),
      requireAuth: authenticated,
    }),
  );
  // Everything else under /api needs a signed-in caller.
  app.use('/api', authenticated);
  app.use('/api/devices', devicesRoutes(sessions));
  app.use('/api/sync', readerLimiter('sync', config.syncRateLimit, 60_000, new PostgresAttemptStore(dataSource, 'sync')), syncRoutes(new SyncStore(dataSource)));
  app.use('/api/uploads', readerLimiter('upload', config.uploadRateLimit, 10 * 60_000, new PostgresAttemptStore(dataSource, 'upload'), ['POST']), uploadsRoutes(new Uploads(new UploadStore(dataSource), config.uploadQuotaBytes), config.uploadMaxBytes));
  app.use('/api/admin', requireAdmin, adminRoutes(new AdminUsers(dataSource), config.devMailDir));
  app.use('/api', apiNotFound);

  if (config.appDir) app.use(staticApp(config.appDir));

  app.use(errorHandler);
  return app;
}
