import { execFileSync } from 'node:child_process';
import { randomUUID } from 'node:crypto';
import path from 'node:path';

import { createDataSource } from '../../sync-server/src/data-access/data-source';
import { migrations } from '../../sync-server/src/data-access/migrations';
import { startCluster, type RunningCluster } from '../../scripts/ops/cluster';
import { GOOD_PASSWORD, uniqueEmail } from '../support/accounts';
import { fieldChange, SyncClient } from '../support/sync-client';
import { testInbox } from '../support/test-server';

const ROOT = path.resolve(__dirname, '../../../..');
const CLUSTER_DB = 'lamplight_cluster';

/**
 * nginx (deploy/nginx.conf) in front of three server processes that reach a fresh database
 * through PgBouncer in transaction mode: the layout of `npm run start:cluster --pgbouncer`.
 * `npm test` installs nginx and pgbouncer first; elsewhere a missing one marks these pending.
 */
describe('Three instances behind nginx, through PgBouncer', () => {
  let cluster: RunningCluster | undefined;
  let missing: string | undefined;
  let directUrl: string;

  beforeAll(async () => {
    execFileSync('bash', ['scripts/db.sh', 'fresh-db', CLUSTER_DB], { cwd: ROOT, stdio: 'ignore' });
    directUrl = execFileSync('bash', ['scripts/db.sh', 'url', CLUSTER_DB], { cwd: ROOT, encoding: 'utf8' }).trim();
    const { port } = await testInbox();
    try {
      cluster = await startCluster({
        pgBouncerPort: 0,
        env: {
          DATABASE_URL: directUrl,
          LAMPLIGHT_JWT_SECRET: 'spec-secret-that-is-at-least-32-characters-long',
          LAMPLIGHT_BCRYPT_COST: '4',
          LAMPLIGHT_AUTH_RATE_LIMIT: '1000',
          SMTP_URL: `smtp://127.0.0.1:${port}`,
          LAMPLIGHT_LOG_LEVEL: 'info',
          NODE_ENV: 'test',
        },
      });
    } catch (error) {
      if (!/is missing/.test(String(error))) throw error;
      missing = String(error);
    }
  }, 120_000); // three Node processes start, connect and migrate together on a busy machine

  afterAll(async () => cluster?.stop(), 30_000);

  function running(): RunningCluster {
    if (!cluster) pending(missing);
    return cluster!;
  }

  /**
   * The log line of the request with this id (nginx's $request_id, echoed as X-Request-Id) and
   * the instance that wrote it. Lines arrive through a pipe, a moment after the response.
   */
  async function logLineOf(id: string | null): Promise<{ instance: string; line: string } | undefined> {
    for (let wait = 0; wait < 40; wait++) {
      for (const instance of running().instances) {
        const line = instance.lines.find((text) => text.includes(`"reqId":"${id}"`));
        if (line) return { instance: instance.name, line };
      }
      await new Promise((resolve) => setTimeout(resolve, 50));
    }
    return undefined;
  }

  async function signIn(email: string): Promise<{ token: string; requestId: string | null }> {
    const res = await fetch(`${running().baseUrl}/api/auth/login`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', 'x-forwarded-for': '203.0.113.77' },
      body: JSON.stringify({ email, password: GOOD_PASSWORD }),
    });
    expect(res.status).toBe(200);
    return { token: ((await res.json()) as { accessToken: string }).accessToken, requestId: res.headers.get('x-request-id') };
  }

  it('When they started together on an empty database, then every migration ran exactly once and all are ready', async () => {
    const { instances, baseUrl } = running();
    const db = createDataSource(directUrl, { poolSize: 1 });
    await db.initialize();
    try {
      const rows: { name: string; times: number }[] = await db.query('SELECT name, count(*)::int AS times FROM migrations GROUP BY name');
      expect(rows.length).toBe(migrations.length);
      expect(rows.every((row) => row.times === 1)).toBeTrue();
    } finally {
      await db.destroy();
    }
    // (Specs run in random order: the kill -9 one may have gone first.)
    const alive = instances.filter((instance) => instance.child.signalCode === null);
    expect(alive.length).toBeGreaterThanOrEqual(2);
    for (const instance of alive) expect((await fetch(`http://127.0.0.1:${instance.port}/api/ready`)).status).toBe(200);
    expect((await fetch(`${baseUrl}/api/ready`)).status).toBe(200);
  });

  it('When a client signs in through the proxy with a forged X-Forwarded-For, then the server sees the address nginx saw', async () => {
    const email = uniqueEmail('proxied');
    const registered = await fetch(`${running().baseUrl}/api/auth/register`, {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify({ email, password: GOOD_PASSWORD, displayName: 'Maren Solberg' }),
    });
    expect(registered.status).toBe(201);

    const { requestId } = await signIn(email);

    const logged = await logLineOf(requestId);
    expect(JSON.parse(logged!.line).req.network).toBe('127.0.0.0/24'); // not 203.0.113.0/24
  });

  it("When a body is larger than any the server takes, then nginx refuses it with the server's JSON 413", async () => {
    const res = await fetch(`${running().baseUrl}/api/uploads`, {
      method: 'POST',
      headers: { 'content-type': 'application/octet-stream' },
      body: new Uint8Array(2 * 1024 * 1024 + 65 * 1024), // over LAMPLIGHT_UPLOAD_MAX_BYTES + the multipart allowance
    });

    expect(res.status).toBe(413);
    expect(await res.json()).toEqual({ error: { code: 'too_large', message: 'Request body is too large', details: null } });
  });

  it('When one instance is killed with kill -9 while two devices push, then no acknowledged write is lost and both carry on', async () => {
    const { baseUrl, instances } = running();
    const email = uniqueEmail('kill-nine');
    await fetch(`${baseUrl}/api/auth/register`, {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify({ email, password: GOOD_PASSWORD, displayName: 'Tove Lindqvist' }),
    });
    const devices = await Promise.all(['tablet', 'phone'].map(async (name) => ({ name, token: (await signIn(email)).token, deviceId: randomUUID() })));
    const acknowledged = new Map<string, string>(); // rowId → title
    const servers = new Map<string, Set<string>>(); // device → instances that answered its pushes
    let refusals = 0;
    let killed = false;
    const victim = instances.find((instance) => instance.child.exitCode === null)!;

    /** Pushes like a device's outbox: a change stays queued until a 200 answers it. */
    async function pushUntilAcknowledged(device: (typeof devices)[number], count: number) {
      for (let n = 0; n < count; n++) {
        const rowId = randomUUID();
        const title = `${device.name} ledger ${n}`;
        const change = fieldChange(rowId, 'title', title, { wall: Date.now(), node: device.name });
        for (let attempt = 0; ; attempt++) {
          if (attempt > 20) throw new Error(`${device.name}: push ${n} never acknowledged`);
          const res = await fetch(`${baseUrl}/api/sync/push`, {
            method: 'POST',
            headers: { 'content-type': 'application/json', authorization: `Bearer ${device.token}` },
            body: JSON.stringify({ deviceId: device.deviceId, changes: [change] }),
          }).catch(() => null);
          if (res?.status === 200) {
            acknowledged.set(rowId, title);
            const by = (await logLineOf(res.headers.get('x-request-id')))?.instance;
            if (by) servers.set(device.name, (servers.get(device.name) ?? new Set()).add(by));
            break;
          }
          refusals++;
          await new Promise((resolve) => setTimeout(resolve, 100));
        }
        if (!killed && acknowledged.size >= 12) {
          killed = true;
          victim.child.kill('SIGKILL');
        }
      }
    }
    await Promise.all(devices.map((device) => pushUntilAcknowledged(device, 20)));

    expect(killed).toBeTrue();
    expect(victim.child.signalCode).toBe('SIGKILL');
    expect(acknowledged.size).toBe(40);
    const answering = new Set([...servers.values()].flatMap((set) => [...set]));
    expect(answering.size).toBeGreaterThanOrEqual(2);
    // A fresh device pulls everything through the proxy: every acknowledged title is there.
    const laptop = new SyncClient(baseUrl, (await signIn(email)).token);
    const { state } = await laptop.pullAll();
    const lost = [...acknowledged].filter(([rowId, title]) => state.get(`books/${rowId}/title`)?.value !== title);
    expect(lost).toEqual([]);
    expect(refusals).toBeLessThan(10);
  }, 90_000);
});
