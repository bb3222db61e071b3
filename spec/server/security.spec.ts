import request from 'supertest';

import { GOOD_PASSWORD, registerReader } from '../support/accounts';
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

    const preflight = await request(app)
      .options('/api/auth/login')
      .set('Origin', 'http://elsewhere.example')
      .set('Access-Control-Request-Method', 'POST');
    const call = await request(app).get('/api/health').set('Origin', 'http://elsewhere.example');

    expect(preflight.headers['access-control-allow-origin']).toBeUndefined();
    expect(call.headers['access-control-allow-origin']).toBeUndefined();
  });

  it('When sign-in is attempted too often from one address, then it answers 429', async () => {
    const app = await createTestApp({ LAMPLIGHT_AUTH_RATE_LIMIT: '3' });
    const { user } = await registerReader(app); // 1st attempt on the limited routes

    await request(app).post('/api/auth/login').send({ email: user.email, password: GOOD_PASSWORD }).expect(200);
    await request(app).post('/api/auth/login').send({ email: user.email, password: 'wrong wrong wrong wrong' }).expect(401);
    const limited = await request(app).post('/api/auth/login').send({ email: user.email, password: GOOD_PASSWORD }).expect(429);

    expect(limited.body.error.code).toBe('too_many_attempts');
  });
});
