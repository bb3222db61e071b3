import { randomUUID } from 'node:crypto';
import { Writable } from 'node:stream';

import request from 'supertest';

import { createApp } from '../../sync-server/src/app';
import { createDataSource } from '../../sync-server/src/data-access/data-source';
import { createSmtpMailer } from '../../sync-server/src/mail/mailer';
import { addressNetwork, createLogger, userIdHash } from '../../sync-server/src/observability/logger';
import { bearer, GOOD_PASSWORD, registerReader, uniqueEmail } from '../support/accounts';
import { fieldChange } from '../support/sync-client';
import { testDatabaseUrl, testDataSource } from '../support/test-database';
import { createTestApp, testConfig } from '../support/test-server';

/** The app with its log lines caught in memory. */
async function appWithCaughtLog(env: Record<string, string> = {}) {
  const lines: string[] = [];
  const sink = new Writable({
    write(chunk: Buffer, _encoding, done) {
      lines.push(
        ...chunk
          .toString()
          .split('\n')
          .filter((line) => line !== ''),
      );
      done();
    },
  });
  const config = await testConfig({ LAMPLIGHT_LOG_LEVEL: 'info', ...env });
  const mailer = createSmtpMailer(config.smtpUrl, config.mailFrom);
  const app = createApp({ config, dataSource: await testDataSource(), mailer, logger: createLogger(config.logLevel, sink) });
  return { app, lines, close: () => mailer.close() };
}

describe('Request logs (pino)', () => {
  it('When a reader signs in and pushes journal text, then each request is one JSON line with ids, route, status and time, and no secrets or text', async () => {
    const { app, lines, close } = await appWithCaughtLog();
    try {
      const email = uniqueEmail('logged');
      const { user } = await registerReader(app, { email });
      const login = await request(app).post('/api/auth/login').send({ email, password: GOOD_PASSWORD }).expect(200);
      const title = `Whispers of the ${randomUUID().slice(0, 8)} lighthouse`;
      await request(app)
        .post('/api/sync/push')
        .set(bearer(login.body.accessToken))
        .set('X-Request-Id', 'spec-request-0001')
        .send({ deviceId: 'spec-device', changes: [fieldChange(randomUUID(), 'title', title, { wall: Date.now() })] })
        .expect(200);

      const records = lines.map((line) => JSON.parse(line) as Record<string, unknown>);
      const push = records.find((record) => record['route'] === '/api/sync/push');
      expect(push).toEqual(jasmine.objectContaining({ reqId: 'spec-request-0001', user: userIdHash(user.id), res: { status: 200 }, level: 30 }));
      expect(push!['responseTime']).toEqual(jasmine.any(Number));
      expect(records.find((record) => record['route'] === '/api/auth/login')?.['res']).toEqual({ status: 200 });
      const everything = lines.join('\n');
      for (const secret of [GOOD_PASSWORD, email, title, login.body.accessToken, login.body.refreshToken, user.id]) {
        expect(everything).not.toContain(secret);
      }
    } finally {
      close();
    }
  });

  it('When a client address is logged, then only its network is (IPv4 /24, IPv6 /48)', () => {
    // Documentation addresses: RFC 5737 (203.0.113.0/24) and RFC 3849 (2001:db8::/32).
    expect(addressNetwork('203.0.113.77')).toBe('203.0.113.0/24');
    expect(addressNetwork('::ffff:203.0.113.77')).toBe('203.0.113.0/24');
    expect(addressNetwork('2001:db8:abcd:12:34::1')).toBe('2001:db8:abcd::/48');
    expect(addressNetwork('2001:db8::7')).toBe('2001:db8:0::/48');
    expect(addressNetwork('not an address')).toBeUndefined();
  });

  it('When the level is warn, then ordinary requests write nothing', async () => {
    const { app, lines, close } = await appWithCaughtLog({ LAMPLIGHT_LOG_LEVEL: 'warn' });
    try {
      await request(app).get('/api/health').expect(200);
      await request(app).get('/robots.txt').expect(200);
      expect(lines).toEqual([]);
    } finally {
      close();
    }
  });
});

describe('GET /metrics', () => {
  it('When asked from this host after a push and a pull, then it answers Prometheus text with route timings and sync sizes', async () => {
    const app = await createTestApp();
    const { accessToken } = await registerReader(app);
    const changes = [1, 2, 3].map((n) => fieldChange(randomUUID(), 'title', `Tide chart ${n}`, { wall: Date.now() - 60_000 }));
    await request(app).post('/api/sync/push').set(bearer(accessToken)).send({ deviceId: 'spec', changes }).expect(200);
    await request(app).get('/api/sync/pull').set(bearer(accessToken)).expect(200);

    const res = await request(app).get('/metrics').expect(200);

    // Prometheus text exposition format 0.0.4 (prometheus.io/docs/instrumenting/exposition_formats/).
    expect(res.headers['content-type']).toContain('text/plain; version=0.0.4');
    expect(res.text).toMatch(/^lamplight_http_request_duration_seconds_bucket\{le="0\.005",method="POST",route="\/api\/sync\/push",status="200"\} \d+$/m);
    expect(res.text).toMatch(/^lamplight_sync_push_changes_bucket\{le="5"\} [1-9]\d*$/m);
    expect(res.text).toMatch(/^lamplight_sync_pull_changes_count [1-9]\d*$/m);
    expect(res.text).toMatch(/^lamplight_sync_merge_seconds_count [1-9]\d*$/m);
    // The changes' clocks were a minute old: at least one push landed in the ≤ 300 s bucket but not in ≤ 15 s.
    const bucket = (le: string) => Number(new RegExp(`^lamplight_sync_outbox_lag_seconds_bucket\\{le="${le}"\\} (\\d+)$`, 'm').exec(res.text)?.[1]);
    expect(bucket('300')).toBeGreaterThan(bucket('15'));
    expect(res.text).toMatch(/^lamplight_db_pool_connections\{state="total"\} [1-9]\d*$/m);
    expect(res.text).toMatch(/^lamplight_process_resident_memory_bytes \d+$/m);
  });

  it('When the caller is elsewhere (forwarded by a trusted proxy), then it is a 404 unless the operator token is sent', async () => {
    const token = 'operator-token-for-the-spec-0123456789';
    const app = await createTestApp({ LAMPLIGHT_TRUST_PROXY: 'loopback', LAMPLIGHT_METRICS_TOKEN: token });

    await request(app).get('/metrics').set('X-Forwarded-For', '203.0.113.9').expect(404);
    await request(app).get('/metrics').set('X-Forwarded-For', '203.0.113.9').set('Authorization', 'Bearer wrong-token').expect(404);
    await request(app).get('/metrics').set('X-Forwarded-For', '203.0.113.9').set('Authorization', `Bearer ${token}`).expect(200);
    await request(app).get('/metrics').set('X-Forwarded-For', '127.0.0.1').expect(200);
  });

  it('When X-Forwarded-For comes from a peer that is not a trusted proxy, then even "127.0.0.1" does not open it', async () => {
    const app = await createTestApp({ LAMPLIGHT_TRUST_PROXY: '' });

    await request(app).get('/metrics').set('X-Forwarded-For', '127.0.0.1').expect(404);
    await request(app).get('/metrics').expect(200);
  });
});

describe('GET /api/health and /api/ready', () => {
  it('When the server runs on a migrated database, then it is alive and ready', async () => {
    const app = await createTestApp();

    expect((await request(app).get('/api/health').expect(200)).body).toEqual({ status: 'ok' });
    expect((await request(app).get('/api/ready').expect(200)).body).toEqual({ status: 'ready', db: 'ok', migrations: 'ok' });
  });

  it('When this build knows a migration the database lacks, then it is alive but not ready', async () => {
    await testDataSource();
    const dataSource = createDataSource(testDatabaseUrl(), { poolSize: 1 });
    await dataSource.initialize();
    const config = await testConfig();
    const mailer = createSmtpMailer(config.smtpUrl, config.mailFrom);
    try {
      (dataSource.migrations as { name?: string }[]).push({ name: 'NotYetApplied9999999999999' });
      const app = createApp({ config, dataSource, mailer });

      await request(app).get('/api/health').expect(200);
      expect((await request(app).get('/api/ready').expect(503)).body).toEqual({ status: 'not_ready', db: 'ok', migrations: 'pending' });
    } finally {
      mailer.close();
      await dataSource.destroy();
    }
  });
});

describe('GET /robots.txt', () => {
  it('When a crawler asks, then it gets a plain-text robots file keeping it out of the API (RFC 9309)', async () => {
    const app = await createTestApp();

    const res = await request(app).get('/robots.txt').expect(200);

    expect(res.headers['content-type']).toContain('text/plain');
    expect(res.text).toMatch(/^User-agent: \*$/m);
    expect(res.text).toMatch(/^Disallow: \/api\/$/m);
  });
});
