import request from 'supertest';

import { randomUUID } from 'node:crypto';

import type { Options } from 'express-rate-limit';

import { PostgresAttemptStore } from '../../sync-server/src/data-access/attempt-store';
import { GOOD_PASSWORD, registerReader, uniqueEmail } from '../support/accounts';
import { testDataSource } from '../support/test-database';
import { createTestApp } from '../support/test-server';

describe('Security headers and limits', () => {
  it('When any page or API answer is sent, then it carries a CSP that allows only our own origin and no inline script', async () => {
    const app = await createTestApp();

    const res = await request(app).get('/api/health');

    const csp = res.headers['content-security-policy'] as string;
    expect(csp).toContain("default-src 'self'");
    expect(csp).toContain("script-src 'self'");
    expect(csp).not.toMatch(/script-src[^;]*unsafe-inline/);
    expect(csp).toContain("frame-ancestors 'none'");
    expect(res.headers['x-content-type-options']).toBe('nosniff');
  });

  it('When another origin calls the API, then no CORS header lets it read the answer', async () => {
    const app = await createTestApp();

    const preflight = await request(app).options('/api/auth/login').set('Origin', 'http://elsewhere.example').set('Access-Control-Request-Method', 'POST');
    const call = await request(app).get('/api/health').set('Origin', 'http://elsewhere.example');

    expect(preflight.headers['access-control-allow-origin']).toBeUndefined();
    expect(call.headers['access-control-allow-origin']).toBeUndefined();
  });

  // Client addresses are from TEST-NET-2 and -3 (RFC 5737, reserved for documentation), sent as
  // a proxy would (these apps trust X-Forwarded-For from loopback): every spec shares one database,
  // so the counts must not be 127.0.0.1's.

  it('When sign-in is attempted too often from one address, then it answers 429', async () => {
    const app = await createTestApp({ LAMPLIGHT_AUTH_RATE_LIMIT: '3', LAMPLIGHT_TRUST_PROXY: 'loopback' });
    const { user } = await registerReader(await createTestApp());
    const from = `203.0.113.${(process.pid % 200) + 1}`;
    await resetAttempts(from);

    await request(app).post('/api/auth/login').set('X-Forwarded-For', from).send({ email: user.email, password: GOOD_PASSWORD }).expect(200);
    await request(app).post('/api/auth/login').set('X-Forwarded-For', from).send({ email: user.email, password: 'wrong wrong wrong wrong' }).expect(401);
    await request(app).post('/api/auth/login').set('X-Forwarded-For', from).send({ email: user.email, password: GOOD_PASSWORD }).expect(200);
    const limited = await request(app).post('/api/auth/login').set('X-Forwarded-For', from).send({ email: user.email, password: GOOD_PASSWORD }).expect(429);

    expect(limited.body.error.code).toBe('too_many_attempts');
    // Another address is not held back.
    await request(app).post('/api/auth/login').set('X-Forwarded-For', '198.51.100.7').send({ email: user.email, password: GOOD_PASSWORD }).expect(200);
  });

  it('When registration and password resets come too often from one address, then they answer 429 too', async () => {
    const app = await createTestApp({ LAMPLIGHT_AUTH_RATE_LIMIT: '2', LAMPLIGHT_TRUST_PROXY: 'loopback' });
    const from = `203.0.113.${(process.pid % 200) + 40}`;
    await resetAttempts(from);
    const register = () =>
      request(app).post('/api/auth/register').set('X-Forwarded-For', from).send({ email: uniqueEmail(), password: GOOD_PASSWORD, displayName: 'Ansel Brook' });

    expect((await register()).status).toBe(201);
    expect((await request(app).post('/api/auth/password-reset/request').set('X-Forwarded-For', from).send({ email: uniqueEmail() })).status).toBe(202);
    expect((await register()).status).toBe(429);
    const reset = await request(app)
      .post('/api/auth/password-reset/confirm')
      .set('X-Forwarded-For', from)
      .send({ token: 'x'.repeat(43), newPassword: GOOD_PASSWORD });
    expect(reset.status).toBe(429);
    expect(reset.body.error.code).toBe('too_many_attempts');
  });

  it('When attempts go to two server instances on one database, then they count together, and no address is stored', async () => {
    const first = await createTestApp({ LAMPLIGHT_AUTH_RATE_LIMIT: '2', LAMPLIGHT_TRUST_PROXY: 'loopback' });
    const second = await createTestApp({ LAMPLIGHT_AUTH_RATE_LIMIT: '2', LAMPLIGHT_TRUST_PROXY: 'loopback' });
    const from = '198.51.100.' + ((process.pid % 200) + 20);
    await resetAttempts(from);
    const attempt = (app: typeof first) =>
      request(app).post('/api/auth/login').set('X-Forwarded-For', from).send({ email: uniqueEmail(), password: 'not the password at all' });

    expect((await attempt(first)).status).toBe(401);
    expect((await attempt(second)).status).toBe(401);
    expect((await attempt(first)).status).toBe(429);
    expect((await attempt(second)).status).toBe(429);

    const dataSource = await testDataSource();
    const keys: { key: string }[] = await dataSource.query('SELECT key FROM attempt_counts');
    expect(keys.some(({ key }) => key.includes(from) || key.includes('198.51'))).toBeFalse();
  });

  it('When a window has passed, then the count starts again', async () => {
    const store = new PostgresAttemptStore(await testDataSource(), `spec-${randomUUID()}`);
    store.init({ windowMs: 300 } as Options);

    expect((await store.increment('client')).totalHits).toBe(1);
    const second = await store.increment('client');
    expect(second.totalHits).toBe(2);
    expect(second.resetTime!.getTime()).toBeGreaterThan(Date.now() - 1_000);
    await store.decrement('client');
    expect((await store.increment('client')).totalHits).toBe(2);
    await new Promise((resolve) => setTimeout(resolve, 400));
    expect((await store.increment('client')).totalHits).toBe(1);
    await store.resetKey('client');
    expect((await store.increment('client')).totalHits).toBe(1);
  });
});

/** Forgets the attempts of `address` (the 'auth' prefix is the app's), so a spec starts from zero. */
async function resetAttempts(address: string): Promise<void> {
  await new PostgresAttemptStore(await testDataSource()).resetKey(address);
}
