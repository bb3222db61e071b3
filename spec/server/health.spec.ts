import request from 'supertest';

import { createApp } from '../../sync-server/src/app';
import { createDataSource } from '../../sync-server/src/data-access/data-source';
import { createSmtpMailer } from '../../sync-server/src/mail/mailer';
import { bearer, registerReader } from '../support/accounts';
import { startTcpProxy } from '../support/tcp-proxy';
import { testDatabaseUrl } from '../support/test-database';
import { createTestApp, testConfig } from '../support/test-server';

describe('GET /api/ready', () => {
  it('When PostgreSQL becomes unreachable, then it answers 503 with db: down while /api/health stays 200', async () => {
    const target = new URL(testDatabaseUrl());
    const proxy = await startTcpProxy(target.hostname, Number(target.port));
    const viaProxy = new URL(target);
    viaProxy.port = String(proxy.port);
    const dataSource = createDataSource(viaProxy.toString(), { poolSize: 1 });
    // A dropped connection surfaces as a pool error event; the probe reports it, not the process.
    await dataSource.initialize();
    const config = await testConfig();
    const mailer = createSmtpMailer(config.smtpUrl, config.mailFrom);
    const app = createApp({ config, dataSource, mailer });
    try {
      await request(app).get('/api/ready').expect(200);

      await proxy.cut();
      const res = await request(app).get('/api/ready').expect(503);

      expect(res.body).toEqual({ status: 'not_ready', db: 'down', migrations: 'unknown' });
      await request(app).get('/api/health').expect(200);
    } finally {
      mailer.close();
      await dataSource.destroy().catch(() => undefined);
    }
  });
});

describe('The API error contract', () => {
  it('When a signed-in reader asks for an unknown /api route, then it answers a JSON 404', async () => {
    const app = await createTestApp();
    const { accessToken } = await registerReader(app);

    const res = await request(app).get('/api/no-such-thing').set(bearer(accessToken)).expect(404);

    expect(res.body.error.code).toBe('not_found');
    expect(res.body.error.message).toContain('/api/no-such-thing');
  });

  it('When nobody is signed in, then an unknown /api route answers 401 and reveals nothing', async () => {
    const app = await createTestApp();

    const res = await request(app).get('/api/no-such-thing').expect(401);

    expect(res.body.error.code).toBe('unauthenticated');
  });

  it('When a body is not valid JSON, then it answers 400 invalid_json', async () => {
    const app = await createTestApp();

    const res = await request(app).post('/api/anything').set('Content-Type', 'application/json').send('{"title": ').expect(400);

    expect(res.body.error).toEqual({ code: 'invalid_json', message: 'Request body is not valid JSON', details: null });
  });
});
