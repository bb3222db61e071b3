import { randomUUID } from 'node:crypto';

import request from 'supertest';

import { loadConfig } from '../../sync-server/src/config';
import { FREE_FAILURES, MAX_WAIT_SECONDS, PasswordFailures, waitAfter } from '../../sync-server/src/data-access/password-failures';
import { GOOD_PASSWORD, bearer, registerReader, uniqueEmail } from '../support/accounts';
import { testDataSource } from '../support/test-database';
import { createTestApp } from '../support/test-server';

const WRONG = 'not the password at all, no';

/** Lets every wait of these keys run out, as if the clock had moved on. */
async function endWaits(): Promise<void> {
  await (await testDataSource()).query(`UPDATE password_failures SET locked_until = now() - interval '1 second' WHERE locked_until > now()`);
}

describe('X-Forwarded-For and LAMPLIGHT_TRUST_PROXY', () => {
  it('When no proxy is configured, then a client rotating X-Forwarded-For is still counted as one address', async () => {
    const app = await createTestApp({ LAMPLIGHT_AUTH_RATE_LIMIT: '3' });
    // The in-process app sees the spec's own loopback address; start its count from zero.
    await (await testDataSource()).query('DELETE FROM attempt_counts');

    const statuses: number[] = [];
    for (let i = 1; i <= 5; i++) {
      // TEST-NET-3 addresses (RFC 5737): a different "client" each time, as the attack run did.
      const res = await request(app).post('/api/auth/login').set('X-Forwarded-For', `203.0.113.${i}`).send({ email: uniqueEmail(), password: WRONG });
      statuses.push(res.status);
    }

    expect(statuses).toEqual([401, 401, 401, 429, 429]);
    await (await testDataSource()).query('DELETE FROM attempt_counts');
  });

  it('When LAMPLIGHT_TRUST_PROXY names addresses, ranges or loopback, then it is accepted; anything else stops the start', () => {
    const base = { DATABASE_URL: 'postgres://x@127.0.0.1/x', LAMPLIGHT_JWT_SECRET: 'x'.repeat(32) };

    expect(loadConfig(base).trustProxy).toEqual([]);
    expect(loadConfig({ ...base, LAMPLIGHT_TRUST_PROXY: 'loopback, 10.0.0.0/8 ,fd00::1' }).trustProxy).toEqual(['loopback', '10.0.0.0/8', 'fd00::1']);
    for (const bad of ['everyone', '10.0.0.0/33', '300.1.1.1', 'true', '*']) {
      expect(() => loadConfig({ ...base, LAMPLIGHT_TRUST_PROXY: bad }))
        .withContext(bad)
        .toThrowError(/LAMPLIGHT_TRUST_PROXY/);
    }
  });
});

describe('Wrong passwords per account', () => {
  it('waits 0 for the first few, then doubles from 30 s up to 15 minutes (OWASP Authentication Cheat Sheet: throttling)', () => {
    expect(waitAfter(FREE_FAILURES - 1)).toBe(0);
    expect(waitAfter(FREE_FAILURES)).toBe(30);
    expect(waitAfter(FREE_FAILURES + 1)).toBe(60);
    expect(waitAfter(FREE_FAILURES + 10)).toBe(MAX_WAIT_SECONDS);
  });

  it('When wrong sign-ins for one account come from many addresses, then it answers 429 with Retry-After, even to the right password', async () => {
    const app = await createTestApp({ LAMPLIGHT_TRUST_PROXY: 'loopback' });
    const email = uniqueEmail('guessed');
    await registerReader(app, { email });
    const from = (i: number) => `198.51.100.${i}`;

    for (let i = 1; i <= FREE_FAILURES; i++) {
      await request(app).post('/api/auth/login').set('X-Forwarded-For', from(i)).send({ email, password: WRONG }).expect(401);
    }
    const held = await request(app).post('/api/auth/login').set('X-Forwarded-For', from(99)).send({ email, password: GOOD_PASSWORD });

    expect(held.status).toBe(429);
    expect(held.body.error.code).toBe('too_many_attempts');
    expect(Number(held.headers['retry-after'])).toBeGreaterThan(0);
    expect(Number(held.headers['retry-after'])).toBeLessThanOrEqual(30);

    await endWaits();
    await request(app).post('/api/auth/login').send({ email, password: GOOD_PASSWORD }).expect(200);
    // A right password clears the count: one more wrong one is not held back.
    await request(app).post('/api/auth/login').send({ email, password: WRONG }).expect(401);
  });

  it('When the e-mail has no account, then it is held back the same way (the wait tells nothing)', async () => {
    const app = await createTestApp();
    const email = uniqueEmail('nobody');

    for (let i = 1; i <= FREE_FAILURES; i++) await request(app).post('/api/auth/login').send({ email, password: WRONG }).expect(401);

    await request(app).post('/api/auth/login').send({ email, password: WRONG }).expect(429);
  });

  it('When a day passes without a wrong password, then the count starts again and old rows are removed', async () => {
    const failures = new PasswordFailures(await testDataSource());
    const key = `spec:${randomUUID()}`;
    for (let i = 1; i <= FREE_FAILURES; i++) await failures.fail(key);
    expect(await failures.secondsToWait(key)).toBeGreaterThan(0);
    const db = await testDataSource();
    const before: { n: number }[] = await db.query('SELECT count(*)::int AS n FROM password_failures');
    await db.query(`UPDATE password_failures SET updated_at = now() - interval '25 hours', locked_until = NULL`);

    expect(await failures.fail(key)).toBe(0); // counted afresh: the first wrong password of a new day
    const after: { n: number }[] = await db.query('SELECT count(*)::int AS n FROM password_failures');
    expect(after[0]!.n).toBe(1);
    expect(before[0]!.n).toBeGreaterThanOrEqual(1);
  });

  it('When a stolen access token guesses the current password, then password change and deletion are held back by user id', async () => {
    const app = await createTestApp();
    const signedIn = await registerReader(app);
    const change = (currentPassword: string) =>
      request(app).post('/api/auth/password').set(bearer(signedIn.accessToken)).send({ currentPassword, newPassword: 'seven herons on a frozen canal' });
    const remove = (password: string) => request(app).delete('/api/auth/account').set(bearer(signedIn.accessToken)).send({ password });

    for (let i = 1; i < FREE_FAILURES; i++) await change(WRONG).expect(400);
    await remove(WRONG).expect(400);

    expect((await change(GOOD_PASSWORD)).status).toBe(429);
    expect((await remove(GOOD_PASSWORD)).status).toBe(429);
    const user = await (await testDataSource()).query('SELECT 1 FROM users WHERE id = $1', [signedIn.user.id]);
    expect(user.length).toBe(1);
  });
});
