import express, { type Express } from 'express';
import type { DataSource } from 'typeorm';

import { apiNotFound, errorHandler } from './errors';
import { healthRoutes } from './entry-points/health.routes';
import { staticApp } from './entry-points/static-app';

export interface AppDependencies {
  readonly dataSource: DataSource;
  /** Folder of the built Angular app, or `null` for an API-only server (specs). */
  readonly appDir: string | null;
}

/** Builds the Express app without listening, so specs can run it in-process. */
export function createApp({ dataSource, appDir }: AppDependencies): Express {
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', 'loopback');

  app.use('/api', express.json({ limit: '1mb' }));
  app.use('/api/health', healthRoutes(dataSource));
  app.use('/api', apiNotFound);

  if (appDir) app.use(staticApp(appDir));

  app.use(errorHandler);
  return app;
}
