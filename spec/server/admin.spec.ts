import type { Express } from 'express';
import request from 'supertest';

import { bearer, GOOD_PASSWORD, registerAdmin, registerReader, uniqueEmail } from '../support/accounts';
import { createTestApp, testInbox } from '../support/test-server';

describe('/api/admin', () => {
  let app: Express;
  beforeAll(async () => (app = await createTestApp()));

  it('When a reader asks for the account list, then it answers 403', async () => {
    const reader = await registerReader(app);

    const res = await request(app).get('/api/admin/users').set(bearer(reader.accessToken)).expect(403);

    expect(res.body.error.code).toBe('forbidden');
  });

  it('When an admin asks, then every account is listed with dates and stored size', async () => {
    const admin = await registerAdmin(app);
    const reader = await registerReader(app);

    const res = await request(app).get('/api/admin/users').set(bearer(admin.accessToken)).expect(200);

    const row = res.body.find((u: { id: string }) => u.id === reader.user.id);
    expect(row).toEqual({
      id: reader.user.id,
      email: reader.user.email,
      displayName: reader.user.displayName,
      role: 'reader',
      createdAt: jasmine.stringMatching(/^\d{4}-/),
      lastSeenAt: jasmine.stringMatching(/^\d{4}-/),
      disabled: false,
      storedBytes: jasmine.any(Number),
    });
  });

  it('When an admin disables an account, then it cannot sign in, refresh or call the API; its data is kept', async () => {
    const admin = await registerAdmin(app);
    const email = uniqueEmail();
    const reader = await registerReader(app, { email });

    await request(app).patch(`/api/admin/users/${reader.user.id}`).set(bearer(admin.accessToken)).send({ disabled: true }).expect(200);

    const login = await request(app).post('/api/auth/login').send({ email, password: GOOD_PASSWORD }).expect(403);
    expect(login.body.error.code).toBe('account_disabled');
    await request(app).post('/api/auth/refresh').send({ refreshToken: reader.refreshToken }).expect(403);
    await request(app).get('/api/auth/me').set(bearer(reader.accessToken)).expect(403);

    await request(app).patch(`/api/admin/users/${reader.user.id}`).set(bearer(admin.accessToken)).send({ disabled: false }).expect(200);
    await request(app).post('/api/auth/login').send({ email, password: GOOD_PASSWORD }).expect(200);
  });

  it('When an admin grants admin, then the new admin may list accounts at once', async () => {
    const admin = await registerAdmin(app);
    const reader = await registerReader(app);

    const res = await request(app).patch(`/api/admin/users/${reader.user.id}`).set(bearer(admin.accessToken)).send({ role: 'admin' }).expect(200);

    expect(res.body.role).toBe('admin');
    await request(app).get('/api/admin/users').set(bearer(reader.accessToken)).expect(200);
  });

  it('When an admin tries to disable themselves or drop their own role, then it answers 400', async () => {
    const admin = await registerAdmin(app);

    const disable = await request(app).patch(`/api/admin/users/${admin.user.id}`).set(bearer(admin.accessToken)).send({ disabled: true }).expect(400);
    await request(app).patch(`/api/admin/users/${admin.user.id}`).set(bearer(admin.accessToken)).send({ role: 'reader' }).expect(400);

    expect(disable.body.error.details).toEqual({ disabled: 'You cannot change this on your own account' });
  });

  it('When the change is empty or the role unknown, then it answers 400 naming the field', async () => {
    const admin = await registerAdmin(app);
    const reader = await registerReader(app);

    const empty = await request(app).patch(`/api/admin/users/${reader.user.id}`).set(bearer(admin.accessToken)).send({}).expect(400);
    const role = await request(app).patch(`/api/admin/users/${reader.user.id}`).set(bearer(admin.accessToken)).send({ role: 'owner' }).expect(400);

    expect(Object.keys(empty.body.error.details)).toEqual(['disabled']);
    expect(Object.keys(role.body.error.details)).toEqual(['role']);
  });

  it('When not in production, then admins can read the caught mail; readers cannot', async () => {
    const admin = await registerAdmin(app);
    const reader = await registerReader(app, { displayName: 'Noor Haddad' });
    await (await testInbox()).inbox.waitFor((m) => m.to.includes(reader.user.email));

    const res = await request(app).get('/api/admin/mail').set(bearer(admin.accessToken)).expect(200);
    await request(app).get('/api/admin/mail').set(bearer(reader.accessToken)).expect(403);

    const welcome = res.body.find((m: { to: string[] }) => m.to.includes(reader.user.email));
    expect(welcome.subject).toBe('Welcome to Lamplight');
  });

  it('When in production, then there is no mail page', async () => {
    const production = await createTestApp({ NODE_ENV: 'production', LAMPLIGHT_BCRYPT_COST: '10' });
    const admin = await registerAdmin(production);

    await request(production).get('/api/admin/mail').set(bearer(admin.accessToken)).expect(404);
  });
});
