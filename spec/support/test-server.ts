import type { AddressInfo } from 'node:net';
import type { Server } from 'node:http';
import path from 'node:path';

import type { Express } from 'express';

import { createApp } from '../../sync-server/src/app';
import { testDataSource } from './test-database';

export interface RunningServer {
  readonly app: Express;
  readonly baseUrl: string;
  close(): Promise<void>;
}

/** The real server, in-process on a free loopback port, optionally serving the built app. */
export async function startTestServer(options: { withApp?: boolean } = {}): Promise<RunningServer> {
  const dataSource = await testDataSource();
  const appDir = options.withApp ? path.resolve(__dirname, '../../../app/browser') : null;
  const app = createApp({ dataSource, appDir });
  const server: Server = await new Promise((resolve) => {
    const listening = app.listen(0, '127.0.0.1', () => resolve(listening));
  });
  const { port } = server.address() as AddressInfo;
  return {
    app,
    baseUrl: `http://127.0.0.1:${port}`,
    close: () =>
      new Promise((resolve) => {
        server.closeAllConnections();
        server.close(() => resolve());
      }),
  };
}
