import { spawn, type ChildProcess } from 'node:child_process';
import { randomUUID } from 'node:crypto';
import path from 'node:path';

import { fieldChange, asObject, SyncClient } from '../support/sync-client';
import { GOOD_PASSWORD, uniqueEmail } from '../support/accounts';
import { testConfig, testInbox } from '../support/test-server';
import { testDatabaseUrl } from '../support/test-database';

const MAIN = path.resolve(__dirname, '../../sync-server/src/main.js');

/** Every process started here, so none outlives the spec even if a step times out. */
const children: ChildProcess[] = [];

/** Starts a real server process (as in production) on a free port; resolves with its base URL. */
function startServerProcess(env: Record<string, string>): Promise<{ baseUrl: string; child: ChildProcess }> {
  return new Promise((resolve, reject) => {
    const child = spawn(process.execPath, [MAIN], { env: { ...process.env, ...env, PORT: '0' }, stdio: ['ignore', 'pipe', 'inherit'] });
    children.push(child);
    const timer = setTimeout(() => reject(new Error('server process did not start')), 20_000);
    child.stdout!.on('data', (chunk: Buffer) => {
      const match = /running at (http:\/\/127\.0\.0\.1:\d+)\//.exec(chunk.toString());
      if (match) {
        clearTimeout(timer);
        resolve({ baseUrl: match[1]!, child });
      }
    });
    child.on('exit', (code) => reject(new Error(`server process exited with ${code}`)));
  });
}

/**
 * What a server process needs: the test database and inbox, a spec secret, a low bcrypt cost,
 * and an attempt limit to speak of (attempts are counted in the shared database, by address).
 */
async function serverEnv(): Promise<Record<string, string>> {
  const { port } = await testInbox();
  return {
    DATABASE_URL: testDatabaseUrl(),
    LAMPLIGHT_JWT_SECRET: 'spec-secret-that-is-at-least-32-characters-long',
    LAMPLIGHT_BCRYPT_COST: '4',
    LAMPLIGHT_AUTH_RATE_LIMIT: '100000',
    SMTP_URL: `smtp://127.0.0.1:${port}`,
    NODE_ENV: 'test',
  };
}

async function signIn(baseUrl: string, email: string): Promise<string> {
  const res = await fetch(`${baseUrl}/api/auth/login`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email, password: GOOD_PASSWORD }),
  });
  return ((await res.json()) as { accessToken: string }).accessToken;
}

describe('Two server instances on one PostgreSQL (behind a load balancer)', () => {
  afterAll(() => children.forEach((child) => child.kill('SIGTERM')));

  it('When one device pushes to the first and another pulls from the second, then they converge', async () => {
    const config = await testConfig();
    const env = await serverEnv();
    const [first, second] = await Promise.all([startServerProcess(env), startServerProcess(env)]);
    expect(first.baseUrl).not.toBe(second.baseUrl);
    expect(config.databaseUrl).toBe(env.DATABASE_URL);

    const email = uniqueEmail('two-servers');
    const registered = await fetch(`${first.baseUrl}/api/auth/register`, {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify({ email, password: GOOD_PASSWORD, displayName: 'Linnea Achterberg' }),
    });
    expect(registered.status).toBe(201);
    const tablet = new SyncClient(first.baseUrl, await signIn(first.baseUrl, email));
    const laptop = new SyncClient(second.baseUrl, await signIn(second.baseUrl, email));
    const row = randomUUID();
    const now = Date.now();

    await tablet.push([fieldChange(row, 'title', 'The Orchard Ledger', { wall: now, node: 'tablet' })]);
    await laptop.push([fieldChange(row, 'rating', 4, { wall: now + 1, node: 'laptop' })]);
    const onLaptop = await laptop.pullAll();
    const onTablet = await tablet.pullAll();

    expect(onLaptop.state.get(`books/${row}/title`)?.value).toBe('The Orchard Ledger');
    expect(asObject(onLaptop.state)).toEqual(asObject(onTablet.state));
    expect(onTablet.state.get(`books/${row}/rating`)?.value).toBe(4);
  }, 60_000); // two Node processes start, connect and migrate: slow on a busy machine

  it('When a server starts with LAMPLIGHT_ADMIN_EMAIL of an existing reader, then that reader is an admin', async () => {
    const email = uniqueEmail('first-admin-at-start');
    const env = await serverEnv();
    const plain = await startServerProcess(env);
    const registered = await fetch(`${plain.baseUrl}/api/auth/register`, {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify({ email, password: GOOD_PASSWORD, displayName: 'Oda Rasmussen' }),
    });
    expect(((await registered.json()) as { user: { role: string } }).user.role).toBe('reader');

    const withAdmin = await startServerProcess({ ...env, LAMPLIGHT_ADMIN_EMAIL: email });
    const res = await fetch(`${withAdmin.baseUrl}/api/auth/login`, {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify({ email, password: GOOD_PASSWORD }),
    });
    expect(((await res.json()) as { user: { role: string } }).user.role).toBe('admin');
  }, 60_000);
});
