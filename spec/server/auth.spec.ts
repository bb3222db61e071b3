import { createHash } from 'node:crypto';

import type { Express } from 'express';
import { SignJWT } from 'jose';
import request from 'supertest';

import { bearer, GOOD_PASSWORD, registerReader, uniqueEmail } from '../support/accounts';
import { testDataSource } from '../support/test-database';
import { createTestApp, testInbox } from '../support/test-server';

const SECRET = new TextEncoder().encode('spec-secret-that-is-at-least-32-characters-long');

describe('POST /api/auth/register', () => {
  let app: Express;
  beforeAll(async () => (app = await createTestApp()));

  it('When the fields are good, then it answers 201 with the user and a token pair', async () => {
    const email = uniqueEmail();
    const res = await request(app)
      .post('/api/auth/register')
      .send({ email: email.toUpperCase(), password: GOOD_PASSWORD, displayName: '  Ilse Varga ' })
      .expect(201);

    expect(res.body.user).toEqual({ id: jasmine.any(String), email, displayName: 'Ilse Varga', role: 'reader' });
    expect(res.body.accessToken.split('.').length).toBe(3);
    expect(res.body.refreshToken.length).toBeGreaterThanOrEqual(40);
  });

  it('When the e-mail is taken, then it answers 409', async () => {
    const email = uniqueEmail();
    await registerReader(app, { email });

    const res = await request(app).post('/api/auth/register').send({ email, password: GOOD_PASSWORD, displayName: 'Other' }).expect(409);

    expect(res.body.error.code).toBe('email_taken');
    expect(res.body.error.details).toEqual({ email: 'An account already uses this e-mail' });
  });

  it('When fields are bad, then it answers 400 naming each field and the reason', async () => {
    const res = await request(app).post('/api/auth/register').send({ email: 'not-an-address', password: 'short', displayName: '' }).expect(400);

    expect(res.body.error.code).toBe('invalid_input');
    expect(res.body.error.details).toEqual({
      email: 'Enter an e-mail address like name@example.com',
      password: 'Use at least 15 characters',
      displayName: 'Name is required',
    });
  });

  it('When the password is on the blocklist, then it is refused (NIST SP 800-63B-4 §3.1.1.2)', async () => {
    const res = await request(app).post('/api/auth/register').send({ email: uniqueEmail(), password: 'passwordpassword', displayName: 'Ilse' }).expect(400);

    expect(res.body.error.details.password).toContain('too common');
  });

  it('When two long passwords share their first 72 bytes, then they are still different passwords', async () => {
    // bcrypt alone reads 72 bytes; the SHA-256 pre-digest makes every byte count.
    const prefix = 'the tide came in over the slate steps and the lamps along the harbour wall '; // 75 bytes
    const email = uniqueEmail();
    await registerReader(app, { email, password: `${prefix}one` });

    await request(app)
      .post('/api/auth/login')
      .send({ email, password: `${prefix}two` })
      .expect(401);
    await request(app)
      .post('/api/auth/login')
      .send({ email, password: `${prefix}one` })
      .expect(200);
  });

  it('When an account registers, then a welcome e-mail reaches its address over SMTP, without the chosen name', async () => {
    const { inbox } = await testInbox();
    const email = uniqueEmail('welcome');

    await registerReader(app, { email, displayName: 'Tove Lindqvist' });
    const mail = await inbox.waitFor((m) => m.to.includes(email));

    expect(mail.subject).toBe('Welcome to Lamplight');
    expect(mail.text).not.toContain('Tove Lindqvist');
    expect(mail.text).toContain('/verify-email#token=');
    expect(mail.text).toContain('never share your address');
  });

  it('When the e-mail is LAMPLIGHT_ADMIN_EMAIL, then the new account is an admin', async () => {
    const email = uniqueEmail('first-admin');
    const adminApp = await createTestApp({ LAMPLIGHT_ADMIN_EMAIL: email });

    const { user } = await registerReader(adminApp, { email });

    expect(user.role).toBe('admin');
  });
});

describe('POST /api/auth/login', () => {
  let app: Express;
  beforeAll(async () => (app = await createTestApp()));

  it('When a refresh token is issued, then PostgreSQL keeps only its SHA-256 digest', async () => {
    const { refreshToken, user } = await registerReader(app);

    const dataSource = await testDataSource();
    const stored: { token_hash: string }[] = await dataSource.query(
      'SELECT t.token_hash FROM refresh_tokens t JOIN device_sessions s ON s.id = t.session_id WHERE s.user_id = $1',
      [user.id],
    );
    expect(stored.length).toBe(1);
    expect(stored[0]!.token_hash).not.toContain(refreshToken);
    // The digest as Node's own crypto module (OpenSSL) computes it, FIPS 180-4 SHA-256.
    expect(stored[0]!.token_hash).toBe(createHash('sha256').update(refreshToken).digest('hex'));
  });

  it('When the password is right, then it answers 200 with the user and a token pair', async () => {
    const email = uniqueEmail();
    await registerReader(app, { email });

    const res = await request(app).post('/api/auth/login').send({ email, password: GOOD_PASSWORD }).expect(200);

    expect(res.body.user.email).toBe(email);
    expect(typeof res.body.accessToken).toBe('string');
    expect(typeof res.body.refreshToken).toBe('string');
  });

  it('When the e-mail is unknown or the password wrong, then both get the same 401', async () => {
    const email = uniqueEmail();
    await registerReader(app, { email });

    const unknown = await request(app).post('/api/auth/login').send({ email: uniqueEmail(), password: GOOD_PASSWORD }).expect(401);
    const wrong = await request(app).post('/api/auth/login').send({ email, password: 'not the password at all' }).expect(401);

    expect(unknown.body).toEqual(wrong.body);
    expect(wrong.body.error.code).toBe('invalid_credentials');
  });

  it('When the body is missing fields, then it answers 400 per field', async () => {
    const res = await request(app).post('/api/auth/login').send({}).expect(400);

    expect(Object.keys(res.body.error.details).sort()).toEqual(['email', 'password']);
  });
});

describe('POST /api/auth/refresh', () => {
  let app: Express;
  beforeAll(async () => (app = await createTestApp()));

  it('When the refresh token is current, then it returns a new pair and the old one stops working', async () => {
    const first = await registerReader(app);

    const rotated = await request(app).post('/api/auth/refresh').send({ refreshToken: first.refreshToken }).expect(200);

    expect(Object.keys(rotated.body).sort()).toEqual(['accessToken', 'refreshToken']);
    expect(rotated.body.refreshToken).not.toBe(first.refreshToken);
    await request(app).get('/api/auth/me').set(bearer(rotated.body.accessToken)).expect(200);
  });

  it('When an old refresh token is used again after the grace window, then the whole family is revoked (RFC 9700 §4.14.2)', async () => {
    const first = await registerReader(app);
    const second = (await request(app).post('/api/auth/refresh').send({ refreshToken: first.refreshToken }).expect(200)).body;
    const digest = createHash('sha256').update(first.refreshToken).digest('hex');
    await (await testDataSource()).query(`UPDATE refresh_tokens SET used_at = used_at - interval '1 minute' WHERE token_hash = $1`, [digest]);

    const reuse = await request(app).post('/api/auth/refresh').send({ refreshToken: first.refreshToken }).expect(401);

    expect(reuse.body.error.code).toBe('refresh_reused');
    // The legitimate holder's newer token and access token die with the family.
    const after = await request(app).post('/api/auth/refresh').send({ refreshToken: second.refreshToken }).expect(401);
    expect(after.body.error.code).toBe('refresh_revoked');
    await request(app).get('/api/auth/me').set(bearer(second.accessToken)).expect(401);
  });

  it('When the refresh token is unknown, then it answers 401', async () => {
    const res = await request(app)
      .post('/api/auth/refresh')
      .send({ refreshToken: 'x'.repeat(43) })
      .expect(401);

    expect(res.body.error.code).toBe('refresh_unknown');
  });
});

describe('POST /api/auth/logout', () => {
  it('When a device signs out, then its refresh and access tokens stop working', async () => {
    const app = await createTestApp();
    const signedIn = await registerReader(app);

    await request(app).post('/api/auth/logout').set(bearer(signedIn.accessToken)).expect(204);

    await request(app).post('/api/auth/refresh').send({ refreshToken: signedIn.refreshToken }).expect(401);
    const me = await request(app).get('/api/auth/me').set(bearer(signedIn.accessToken)).expect(401);
    expect(me.body.error.code).toBe('session_revoked');
  });
});

describe('Bearer tokens on protected routes', () => {
  let app: Express;
  let signedIn: Awaited<ReturnType<typeof registerReader>>;
  beforeAll(async () => {
    app = await createTestApp();
    signedIn = await registerReader(app);
  });

  const claims = () => ({ sid: JSON.parse(Buffer.from(signedIn.accessToken.split('.')[1]!, 'base64url').toString()).sid, role: 'reader' });

  it('When the token is good, then GET /api/auth/me answers the user', async () => {
    const res = await request(app).get('/api/auth/me').set(bearer(signedIn.accessToken)).expect(200);

    expect(res.body).toEqual(signedIn.user);
  });

  it('When the header is missing or malformed, then it answers 401', async () => {
    await request(app).get('/api/devices').expect(401);
    await request(app).get('/api/devices').set('Authorization', 'Basic abc').expect(401);
    await request(app).get('/api/devices').set(bearer('not-a-jwt')).expect(401);
  });

  it('When the token has expired, then it answers 401 token_expired', async () => {
    const expired = await new SignJWT(claims())
      .setProtectedHeader({ alg: 'HS256' })
      .setSubject(signedIn.user.id)
      .setIssuer('lamplight')
      .setAudience('lamplight-app')
      .setIssuedAt(Math.floor(Date.now() / 1000) - 3600)
      .setExpirationTime(Math.floor(Date.now() / 1000) - 60)
      .sign(SECRET);

    const res = await request(app).get('/api/devices').set(bearer(expired)).expect(401);

    expect(res.body.error.code).toBe('token_expired');
  });

  it('When the token is signed with another key, then it answers 401', async () => {
    const forged = await new SignJWT(claims())
      .setProtectedHeader({ alg: 'HS256' })
      .setSubject(signedIn.user.id)
      .setIssuer('lamplight')
      .setAudience('lamplight-app')
      .setIssuedAt()
      .setExpirationTime('5m')
      .sign(new TextEncoder().encode('another-secret-another-secret-another-secret'));

    const res = await request(app).get('/api/devices').set(bearer(forged)).expect(401);

    expect(res.body.error.code).toBe('invalid_token');
  });

  it('When the token says alg "none", then it is refused (RFC 8725 §3.1)', async () => {
    const encode = (value: object) => Buffer.from(JSON.stringify(value)).toString('base64url');
    const now = Math.floor(Date.now() / 1000);
    const unsigned = `${encode({ alg: 'none', typ: 'JWT' })}.${encode({
      ...claims(),
      sub: signedIn.user.id,
      iss: 'lamplight',
      aud: 'lamplight-app',
      iat: now,
      exp: now + 300,
    })}.`;

    await request(app).get('/api/devices').set(bearer(unsigned)).expect(401);
  });

  it('When the token uses an algorithm not on the allow-list, then it is refused (RFC 8725 §3.1)', async () => {
    const hs512 = await new SignJWT(claims())
      .setProtectedHeader({ alg: 'HS512' })
      .setSubject(signedIn.user.id)
      .setIssuer('lamplight')
      .setAudience('lamplight-app')
      .setIssuedAt()
      .setExpirationTime('5m')
      .sign(new TextEncoder().encode('spec-secret-that-is-at-least-32-characters-long-and-then-some-more-bytes'));

    await request(app).get('/api/devices').set(bearer(hs512)).expect(401);
  });

  it('When the issuer or audience is wrong, then it is refused (RFC 8725 §3.8, §3.9)', async () => {
    const sign = (issuer: string, audience: string) =>
      new SignJWT(claims())
        .setProtectedHeader({ alg: 'HS256' })
        .setSubject(signedIn.user.id)
        .setIssuer(issuer)
        .setAudience(audience)
        .setIssuedAt()
        .setExpirationTime('5m')
        .sign(SECRET);

    await request(app)
      .get('/api/devices')
      .set(bearer(await sign('someone-else', 'lamplight-app')))
      .expect(401);
    await request(app)
      .get('/api/devices')
      .set(bearer(await sign('lamplight', 'another-app')))
      .expect(401);
  });
});

describe('POST /api/auth/password', () => {
  it('When the current password is right, then the new one works and other devices are signed out', async () => {
    const app = await createTestApp();
    const email = uniqueEmail();
    const laptop = await registerReader(app, { email });
    const tablet = (await request(app).post('/api/auth/login').send({ email, password: GOOD_PASSWORD }).expect(200)).body;
    const newPassword = 'seven herons on a frozen canal';

    await request(app).post('/api/auth/password').set(bearer(laptop.accessToken)).send({ currentPassword: GOOD_PASSWORD, newPassword }).expect(204);

    await request(app).post('/api/auth/login').send({ email, password: GOOD_PASSWORD }).expect(401);
    await request(app).post('/api/auth/login').send({ email, password: newPassword }).expect(200);
    await request(app).get('/api/auth/me').set(bearer(laptop.accessToken)).expect(200);
    await request(app).get('/api/auth/me').set(bearer(tablet.accessToken)).expect(401);
  });

  it('When the current password is wrong, then it answers 400 on currentPassword', async () => {
    const app = await createTestApp();
    const signedIn = await registerReader(app);

    const res = await request(app)
      .post('/api/auth/password')
      .set(bearer(signedIn.accessToken))
      .send({ currentPassword: 'wrong wrong wrong wrong', newPassword: 'seven herons on a frozen canal' })
      .expect(400);

    expect(res.body.error.details).toEqual({ currentPassword: 'The current password is not right' });
  });
});

describe('DELETE /api/auth/account', () => {
  it('When the password is re-entered, then the account and its sessions are deleted', async () => {
    const app = await createTestApp();
    const email = uniqueEmail();
    const signedIn = await registerReader(app, { email });

    await request(app).delete('/api/auth/account').set(bearer(signedIn.accessToken)).send({ password: 'wrong wrong wrong wrong' }).expect(400);
    await request(app).delete('/api/auth/account').set(bearer(signedIn.accessToken)).send({ password: GOOD_PASSWORD }).expect(204);

    const db = await testDataSource();
    expect(await db.query('SELECT 1 FROM users WHERE id = $1', [signedIn.user.id])).toEqual([]);
    expect(await db.query('SELECT 1 FROM device_sessions WHERE user_id = $1', [signedIn.user.id])).toEqual([]);
    await request(app).post('/api/auth/login').send({ email, password: GOOD_PASSWORD }).expect(401);
  });
});
