import type { Express } from 'express';
import { decodeJwt, SignJWT } from 'jose';
import request from 'supertest';

import { bearer, registerReader, uniqueEmail } from '../support/accounts';
import { testDataSource } from '../support/test-database';
import { createTestApp, testInbox } from '../support/test-server';

const SECRET = new TextEncoder().encode('spec-secret-that-is-at-least-32-characters-long');

/** The `#token=` of the first confirmation link in a caught mail. */
function linkToken(text: string): string {
  const match = /\/verify-email#token=([A-Za-z0-9_.-]+)/.exec(text);
  if (!match) throw new Error(`no confirmation link in: ${text}`);
  return match[1]!;
}

async function verifiedAt(userId: string): Promise<Date | null> {
  const rows: { email_verified_at: Date | null }[] = await (await testDataSource()).query('SELECT email_verified_at FROM users WHERE id = $1', [userId]);
  return rows[0]!.email_verified_at;
}

describe('E-mail verification by signed link', () => {
  let app: Express;
  beforeAll(async () => (app = await createTestApp()));

  it('When someone registers another person’s address with a name of their choosing, then no mail to it holds that name until it is confirmed', async () => {
    const { inbox } = await testInbox();
    const email = uniqueEmail('victim');
    const name = 'Visit evil.example now';
    await registerReader(app, { email, displayName: name });
    const welcome = await inbox.waitFor((m) => m.to.includes(email) && m.subject === 'Welcome to Lamplight');

    await request(app).post('/api/auth/password-reset/request').send({ email }).expect(202);
    const reset = await inbox.waitFor((m) => m.to.includes(email) && m.subject.startsWith('Choose a new'));

    expect(welcome.text).not.toContain(name);
    expect(reset.text).not.toContain(name);
    expect(reset.text).toContain('Hello,');
  });

  it('When the link from the welcome mail is opened, then the address is verified, and later mails may greet by name', async () => {
    const { inbox } = await testInbox();
    const email = uniqueEmail('confirms');
    const { user } = await registerReader(app, { email, displayName: 'Maren Holt' });
    const token = linkToken((await inbox.waitFor((m) => m.to.includes(email))).text);
    // RFC 7519: a signed JWT naming this account and address, with an expiry.
    expect(decodeJwt(token)).toEqual(jasmine.objectContaining({ sub: user.id, email, aud: 'lamplight-verify-email' }));

    await request(app).post('/api/auth/verify-email').send({ token }).expect(200, { verified: true });

    expect(await verifiedAt(user.id)).not.toBeNull();
    await request(app).post('/api/auth/password-reset/request').send({ email }).expect(202);
    const reset = await inbox.waitFor((m) => m.to.includes(email) && m.subject.startsWith('Choose a new'));
    expect(reset.text).toContain('Hello Maren Holt,');
  });

  it('When a link is forged, expired, for another address or an access token, then it is refused 400 and nothing is verified', async () => {
    const signedIn = await registerReader(app);
    const sign = (claims: Record<string, unknown>, audience: string, expires: string | number, secret = SECRET) =>
      new SignJWT(claims)
        .setProtectedHeader({ alg: 'HS256' })
        .setSubject(signedIn.user.id)
        .setIssuer('lamplight')
        .setAudience(audience)
        .setIssuedAt()
        .setExpirationTime(expires)
        .sign(secret);
    const forged = await sign({ email: signedIn.user.email }, 'lamplight-verify-email', '1h', new TextEncoder().encode('another-secret-of-at-least-32-characters'));
    const expired = await sign({ email: signedIn.user.email }, 'lamplight-verify-email', Math.floor(Date.now() / 1000) - 10);
    const otherAddress = await sign({ email: 'someone-else@example.com' }, 'lamplight-verify-email', '1h');

    for (const token of [forged, expired, otherAddress, signedIn.accessToken, 'not.a.token']) {
      const res = await request(app).post('/api/auth/verify-email').send({ token });
      expect(res.status).withContext(token.slice(0, 20)).toBe(400);
    }
    expect(await verifiedAt(signedIn.user.id)).toBeNull();
  });

  it('When a signed-in reader asks for a fresh link, then one is sent (no name in it), at most three an hour', async () => {
    const { inbox } = await testInbox();
    const email = uniqueEmail('resend');
    const signedIn = await registerReader(app, { email, displayName: 'Juno Aalto' });
    await inbox.waitFor((m) => m.to.includes(email));
    const ask = () => request(app).post('/api/auth/verify-email/send').set(bearer(signedIn.accessToken));

    await ask().expect(202);
    const mail = await inbox.waitFor((m) => m.to.includes(email) && m.subject.startsWith('Confirm'));
    expect(mail.text).not.toContain('Juno');
    await ask().expect(202);
    await ask().expect(202);
    expect((await ask().expect(429)).body.error.code).toBe('too_many_requests');

    await request(app)
      .post('/api/auth/verify-email')
      .send({ token: linkToken(mail.text) })
      .expect(200);
  });
});
