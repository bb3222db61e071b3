import type { AddressInfo } from 'node:net';
import type { Server } from 'node:http';
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';

import type { Express } from 'express';

import { createApp } from '../../sync-server/src/app';
import { loadConfig, type ServerConfig } from '../../sync-server/src/config';
import { DevInbox } from '../../sync-server/src/mail/dev-inbox';
import { createSmtpMailer, type Mailer } from '../../sync-server/src/mail/mailer';
import { testDatabaseUrl, testDataSource } from './test-database';

/** The built Angular app, for specs that serve it (npm test builds it before the e2e specs). */
export const BUILT_APP_DIR = path.resolve(__dirname, '../../../app/browser');

let inbox: Promise<{ inbox: DevInbox; port: number; dir: string }> | undefined;
const mailers: Mailer[] = [];

/** The real local SMTP inbox, one per spec process, that every test server mails to. */
export function testInbox(): Promise<{ inbox: DevInbox; port: number; dir: string }> {
  inbox ??= (async () => {
    const dir = mkdtempSync(path.join(tmpdir(), 'lamplight-mail-'));
    const devInbox = new DevInbox(dir);
    return { inbox: devInbox, port: await devInbox.listen(0), dir };
  })();
  return inbox;
}

/** Server configuration for specs: the test database and inbox, a low bcrypt cost, no rate limit to speak of. */
export async function testConfig(overrides: Record<string, string> = {}): Promise<ServerConfig> {
  const { port, dir } = await testInbox();
  return loadConfig({
    DATABASE_URL: testDatabaseUrl(),
    LAMPLIGHT_JWT_SECRET: 'spec-secret-that-is-at-least-32-characters-long',
    LAMPLIGHT_BCRYPT_COST: '4',
    LAMPLIGHT_AUTH_RATE_LIMIT: '100000',
    LAMPLIGHT_SYNC_RATE_LIMIT: '100000',
    LAMPLIGHT_UPLOAD_RATE_LIMIT: '100000',
    SMTP_URL: `smtp://127.0.0.1:${port}`,
    LAMPLIGHT_DEV_MAIL_DIR: dir,
    LAMPLIGHT_PUBLIC_URL: 'http://127.0.0.1:8080',
    NODE_ENV: 'test',
    LAMPLIGHT_LOG_LEVEL: process.env['LAMPLIGHT_LOG_LEVEL'] ?? 'silent',
    ...overrides,
  });
}

/** The real app on the test database, not listening (for supertest). */
export async function createTestApp(overrides: Record<string, string> = {}): Promise<Express> {
  const config = await testConfig(overrides);
  const mailer = createSmtpMailer(config.smtpUrl, config.mailFrom);
  mailers.push(mailer);
  return createApp({ config, dataSource: await testDataSource(), mailer });
}

export interface RunningServer {
  readonly app: Express;
  readonly baseUrl: string;
  close(): Promise<void>;
}

/** The real server, in-process on a free loopback port, optionally serving the built app. */
export async function startTestServer(options: { withApp?: boolean; env?: Record<string, string> } = {}): Promise<RunningServer> {
  const app = await createTestApp({ ...(options.withApp ? { LAMPLIGHT_APP_DIR: BUILT_APP_DIR } : {}), ...options.env });
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

// Benchmarks load these helpers outside Jasmine, where there is no afterAll.
if (typeof afterAll === 'function')
  afterAll(async () => {
    // Welcome mails are sent without waiting; give the last ones a moment to land.
    await new Promise((resolve) => setTimeout(resolve, 300));
    for (const mailer of mailers.splice(0)) mailer.close();
    if (inbox) await (await inbox).inbox.close();
    inbox = undefined;
  });
