import express, { type Express } from 'express';
import type { Logger } from 'pino';
import type { DataSource } from 'typeorm';

import type { ServerConfig } from './config';
import { Accounts } from './domain/accounts';
import { AdminUsers } from './domain/admin-users';
import { DeviceSessions } from './domain/device-sessions';
import { EmailVerification } from './domain/email-verification';
import type { Mailer } from './mail/mailer';
import { PasswordResets } from './domain/password-resets';
import { Uploads } from './domain/uploads';
import { adminRoutes } from './entry-points/admin.routes';
import { compressApi } from './entry-points/compress-api';
import { authRoutes } from './entry-points/auth.routes';
import { devicesRoutes } from './entry-points/devices.routes';
import { syncRoutes } from './entry-points/sync.routes';
import { syncEventsRoutes } from './entry-points/sync-events.routes';
import { SyncListener } from './data-access/sync-listener';
import { textsRoutes } from './entry-points/texts.routes';
import { uploadsRoutes } from './entry-points/uploads.routes';
import { catalogueRoutes } from './entry-points/catalogue.routes';
import { Catalogue } from './domain/catalogue/catalogue';
import { SruProvider } from './domain/catalogue/sru-provider';
import { CatalogueCache } from './data-access/catalogue-cache';
import { PostgresAttemptStore } from './data-access/attempt-store';
import { BatchedCountStore } from './data-access/batched-count-store';
import { UploadStore } from './data-access/upload-store';
import { healthRoutes } from './entry-points/health.routes';
import { requireAdmin, requireAuth } from './entry-points/require-auth';
import { attemptLimiter, noStore, readerLimiter, securityHeaders } from './entry-points/security';
import { staticApp } from './entry-points/static-app';
import { metricsRoutes } from './entry-points/metrics.routes';
import { robotsTxt } from './entry-points/robots';
import { apiNotFound, errorHandler } from './errors';
import { circlesRoutes } from './entry-points/circles.routes';
import { CircleInvitations } from './circles/circle-invitations';
import { CircleMembership } from './circles/circle-membership';
import { CircleSyncStore } from './circles/circle-sync-store';
import { CalendarFeeds } from './calendar/calendar-feeds';
import { FEED_SOURCES } from './calendar/feed-sources';
import { calendarFeedRoutes, calendarSettingsRoutes } from './entry-points/calendar.routes';
import { remindersRoutes } from './entry-points/reminders.routes';
import { createLogger } from './observability/logger';
import { MeasuredSyncStore } from './observability/measured-sync-store';
import { trackPool } from './observability/metrics';
import { requestLog } from './observability/request-log';

export interface AppDependencies {
  readonly config: ServerConfig;
  readonly dataSource: DataSource;
  readonly mailer: Mailer;
  /** The process's logger (main.ts makes one); a new one at `config.logLevel` otherwise. */
  readonly logger?: Logger;
}

/**
 * Builds the Express app without listening, so specs can run it in-process. CORS stays closed:
 * the app and the API share one origin, so no Access-Control-* headers are ever sent.
 */
export function createApp({ config, dataSource, mailer, logger = createLogger(config.logLevel) }: AppDependencies): Express {
  const sessions = new DeviceSessions(dataSource, config.jwtSecret);
  const verification = new EmailVerification(dataSource, config, mailer);
  const accounts = new Accounts(dataSource, config, sessions, mailer, verification);
  const resets = new PasswordResets(dataSource, config, sessions, mailer);
  const authenticated = requireAuth(dataSource, config.jwtSecret, config.sessionCheckMs, { namedStatements: !config.dbTransactionPooling });

  const app = express();
  app.disable('x-powered-by');
  // Only these proxies' X-Forwarded-For is believed, so attempt limits count real client addresses.
  app.set('trust proxy', config.trustProxy.length > 0 ? [...config.trustProxy] : false);
  trackPool(dataSource);
  app.use(requestLog(logger));
  app.use(securityHeaders());
  app.use('/api', noStore);

  app.use(metricsRoutes(dataSource, config.metricsToken));
  app.get('/robots.txt', robotsTxt);
  app.use('/api', compressApi());
  const smallJson = express.json({ limit: '64kb' });
  // /api/sync parses its own bodies with the sync contract's limits, once the caller is known.
  // /api/circles/:id/sync/push parses its own too.
  app.use('/api', (req, res, next) => (req.path.startsWith('/sync/') || /^\/circles\/[^/]+\/sync\//.test(req.path) ? next() : smallJson(req, res, next)));
  const probes = healthRoutes(dataSource);
  app.use('/api/health', probes.health);
  app.use('/api/ready', probes.ready);
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
  const calendarFeeds = new CalendarFeeds(dataSource, FEED_SOURCES);
  // Calendar apps cannot sign in: the feed's secret is its key.
  app.use('/api/calendar', calendarFeedRoutes(calendarFeeds));
  // Unsubscribe links in reminder mails work without signing in (a signed token).
  app.use('/api/reminders', remindersRoutes(dataSource, config.jwtSecret));
  // Everything else under /api needs a signed-in caller.
  app.use('/api', authenticated);
  app.use('/api/calendar-feed', calendarSettingsRoutes(calendarFeeds));
  app.use('/api/devices', devicesRoutes(sessions));
  app.use('/api/sync/events', syncEventsRoutes(dataSource, new SyncListener(config.syncEvents.listenDatabaseUrl), config.syncEvents, config.jwtSecret));
  app.use(
    '/api/sync',
    // Counted in memory and shared through PostgreSQL once a second: no database write per sync request.
    readerLimiter('sync', config.syncRateLimit, 60_000, new BatchedCountStore(dataSource, 'sync')),
    syncRoutes(new MeasuredSyncStore(dataSource, { namedStatements: !config.dbTransactionPooling }), config.jwtSecret),
  );
  app.use(
    '/api/uploads',
    readerLimiter('upload', config.uploadRateLimit, 10 * 60_000, new PostgresAttemptStore(dataSource, 'upload'), ['POST']),
    uploadsRoutes(new Uploads(new UploadStore(dataSource), config.uploadQuotaBytes), config.uploadMaxBytes),
  );
  app.use(
    '/api/catalogue',
    catalogueRoutes(
      new Catalogue(
        config.catalogueUrls.map((url) => new SruProvider(url, config.catalogueTimeoutMs)),
        new CatalogueCache(dataSource),
      ),
      readerLimiter('catalogue look-up', config.catalogueRateLimit, 60_000, new PostgresAttemptStore(dataSource, 'catalogue')),
    ),
  );
  app.use('/api/texts', textsRoutes(dataSource));
  app.use(
    '/api/circles',
    // Circle syncs and actions count like a reader's own sync requests, in their own bucket.
    readerLimiter('circle', config.syncRateLimit, 60_000, new PostgresAttemptStore(dataSource, 'circle')),
    circlesRoutes({
      membership: new CircleMembership(dataSource),
      invitations: new CircleInvitations(dataSource, config, mailer),
      store: new CircleSyncStore(dataSource),
      serverSecret: config.jwtSecret,
      // Twenty invitations an hour per reader: a book club's worth, too few to spam with.
      inviteLimiter: readerLimiter('circle invitation', 20, 3600_000, new PostgresAttemptStore(dataSource, 'circle-invite')),
    }),
  );
  app.use('/api/admin', requireAdmin, adminRoutes(new AdminUsers(dataSource), config.devMailDir));
  app.use('/api', apiNotFound);

  if (config.appDir) app.use(staticApp(config.appDir));

  app.use(errorHandler);
  return app;
}
