import express from 'express';
import request from 'supertest';

import { describeError } from '../../sync-server/src/safe-log';
import { errorHandler } from '../../sync-server/src/errors';
import { bearer, GOOD_PASSWORD, registerReader } from '../support/accounts';
import { testDataSource } from '../support/test-database';
import { createTestApp } from '../support/test-server';

const JOURNAL_TEXT = 'the letter I never sent to my sister';

describe('Server logs hold codes and ids, never values', () => {
  it('When PostgreSQL refuses a value, then the description names the SQLSTATE, not the value', async () => {
    const dataSource = await testDataSource();
    const err = await dataSource.query('SELECT $1::integer', [JOURNAL_TEXT]).then(
      () => null,
      (error: unknown) => error,
    );

    const described = describeError(err);

    // 22P02 is invalid_text_representation (PostgreSQL manual, Appendix A "Error Codes").
    expect(described).toContain('22P02');
    expect(described).not.toContain('sister');
    expect(described).not.toContain('SELECT');
  });

  it('When a route fails on the database, then the error handler logs only code, path and caller, and answers 500 without details', async () => {
    const dataSource = await testDataSource();
    const app = express();
    app.get('/api/things/:id', async () => {
      await dataSource.query('INSERT INTO users (id, email, display_name, password_hash) VALUES (gen_random_uuid(), NULL, $1, $2)', [JOURNAL_TEXT, 'x']);
    });
    app.use(errorHandler);
    const logged: string[] = [];
    spyOn(console, 'error').and.callFake((...args: unknown[]) => logged.push(args.map(String).join(' ')));

    const res = await request(app).get('/api/things/42?note=private');

    expect(res.status).toBe(500);
    expect(JSON.stringify(res.body)).not.toContain('sister');
    expect(logged.length).toBe(1);
    // 23502 is not_null_violation (PostgreSQL manual, Appendix A).
    expect(logged[0]).toContain('23502');
    expect(logged[0]).toContain('/api/things/42');
    expect(logged[0]).not.toContain('sister');
    expect(logged[0]).not.toContain('private');
  });
});

describe('Security events in the log', () => {
  it('When a refresh token is presented again after the grace window, then the revocation is logged with ids, not the token', async () => {
    const app = await createTestApp();
    const signedIn = await registerReader(app);
    await request(app).post('/api/auth/refresh').send({ refreshToken: signedIn.refreshToken }).expect(200);
    await (
      await testDataSource()
    ).query(
      `UPDATE refresh_tokens SET used_at = used_at - interval '1 hour' WHERE used_at IS NOT NULL AND session_id IN (SELECT id FROM device_sessions WHERE user_id = $1)`,
      [signedIn.user.id],
    );
    const logged: string[] = [];
    spyOn(console, 'warn').and.callFake((...args: unknown[]) => logged.push(args.map(String).join(' ')));

    await request(app).post('/api/auth/refresh').send({ refreshToken: signedIn.refreshToken }).expect(401);

    expect(logged.length).toBe(1);
    expect(logged[0]).toContain('device session revoked');
    expect(logged[0]).toContain(signedIn.user.id);
    expect(logged[0]).not.toContain(signedIn.refreshToken);
    expect(logged[0]).not.toContain(signedIn.user.email);
  });
});

describe('Cache-Control on private answers', () => {
  it('When tokens, the account or a pull page are answered, then they say no-store (RFC 9111 §5.2.2.5)', async () => {
    const app = await createTestApp();
    const registered = await request(app)
      .post('/api/auth/register')
      .send({ email: `cache-${Date.now()}@example.com`, password: GOOD_PASSWORD, displayName: 'Oda Fenn' });
    const signedIn = await registerReader(app);
    const answers = [
      registered,
      await request(app).post('/api/auth/login').send({ email: signedIn.user.email, password: GOOD_PASSWORD }),
      await request(app).post('/api/auth/refresh').send({ refreshToken: signedIn.refreshToken }),
      await request(app).get('/api/auth/me').set(bearer(signedIn.accessToken)),
      await request(app).get('/api/devices').set(bearer(signedIn.accessToken)),
      await request(app).get('/api/sync/pull').set(bearer(signedIn.accessToken)),
      await request(app).post('/api/auth/login').send({ email: signedIn.user.email, password: 'wrong wrong wrong wrong' }),
    ];

    answers.forEach((res, index) => {
      expect(res.status).toBeLessThan(500);
      expect(res.headers['cache-control']).withContext(`answer ${index}`).toBe('no-store');
    });
  });
});
