import type { Express } from 'express';
import request from 'supertest';

import { bearer, GOOD_PASSWORD, registerReader, uniqueEmail } from '../support/accounts';
import { testDataSource } from '../support/test-database';
import { createTestApp, testInbox } from '../support/test-server';

const NEW_PASSWORD = 'a kettle singing in the far room';

/** Asks for a link and reads the token out of the e-mail the inbox caught. */
async function requestLink(app: Express, email: string): Promise<string> {
  await request(app).post('/api/auth/password-reset/request').send({ email }).expect(202);
  const mail = await (await testInbox()).inbox.waitFor((m) => m.to.includes(email) && m.subject.includes('new Lamplight password'));
  const match = /\/reset-password#token=([A-Za-z0-9_-]+)/.exec(mail.text);
  if (!match) throw new Error(`no link in: ${mail.text}`);
  return match[1]!;
}

describe('Password reset by e-mail', () => {
  let app: Express;
  beforeAll(async () => (app = await createTestApp()));

  it('When the address is unknown, then the answer is the same as for a known one', async () => {
    const known = await registerReader(app);

    const forKnown = await request(app).post('/api/auth/password-reset/request').send({ email: known.user.email }).expect(202);
    const forUnknown = await request(app).post('/api/auth/password-reset/request').send({ email: uniqueEmail() }).expect(202);

    expect(forUnknown.body).toEqual(forKnown.body);
  });

  it('When the link is followed, then the new password works, the old one not, and every device is signed out', async () => {
    const email = uniqueEmail();
    const signedIn = await registerReader(app, { email });
    const token = await requestLink(app, email);

    await request(app).post('/api/auth/password-reset/confirm').send({ token, newPassword: NEW_PASSWORD }).expect(204);

    await request(app).post('/api/auth/login').send({ email, password: GOOD_PASSWORD }).expect(401);
    await request(app).post('/api/auth/login').send({ email, password: NEW_PASSWORD }).expect(200);
    await request(app).get('/api/auth/me').set(bearer(signedIn.accessToken)).expect(401);
  });

  it('When the link is used twice, then the second use is refused', async () => {
    const email = uniqueEmail();
    await registerReader(app, { email });
    const token = await requestLink(app, email);
    await request(app).post('/api/auth/password-reset/confirm').send({ token, newPassword: NEW_PASSWORD }).expect(204);

    const again = await request(app).post('/api/auth/password-reset/confirm').send({ token, newPassword: 'yet another long passphrase' }).expect(400);

    expect(again.body.error.code).toBe('reset_link_invalid');
    await request(app).post('/api/auth/login').send({ email, password: NEW_PASSWORD }).expect(200);
  });

  it('When the link is older than 30 minutes, then it is refused', async () => {
    const email = uniqueEmail();
    const { user } = await registerReader(app, { email });
    const token = await requestLink(app, email);
    await (await testDataSource()).query(`UPDATE password_resets SET expires_at = now() - interval '1 second' WHERE user_id = $1`, [user.id]);

    const res = await request(app).post('/api/auth/password-reset/confirm').send({ token, newPassword: NEW_PASSWORD }).expect(400);

    expect(res.body.error.code).toBe('reset_link_invalid');
  });

  it('When links are stored, then only their hash is kept and they expire after 30 minutes', async () => {
    const email = uniqueEmail();
    const { user } = await registerReader(app, { email });
    const token = await requestLink(app, email);

    const [row] = await (
      await testDataSource()
    ).query(`SELECT token_hash, extract(epoch FROM expires_at - created_at) AS seconds FROM password_resets WHERE user_id = $1`, [user.id]);

    expect(row.token_hash).not.toContain(token);
    expect(row.token_hash).toMatch(/^[0-9a-f]{64}$/);
    expect(Math.round(Number(row.seconds))).toBe(30 * 60);
  });

  it('When the new password breaks the policy, then it answers 400 on newPassword and the link still works', async () => {
    const email = uniqueEmail();
    await registerReader(app, { email });
    const token = await requestLink(app, email);

    const res = await request(app).post('/api/auth/password-reset/confirm').send({ token, newPassword: 'too short' }).expect(400);
    await request(app).post('/api/auth/password-reset/confirm').send({ token, newPassword: NEW_PASSWORD }).expect(204);

    expect(res.body.error.details).toEqual({ newPassword: 'Use at least 15 characters' });
  });
});
