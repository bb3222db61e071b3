import type { Express } from 'express';
import request from 'supertest';

import { bearer, GOOD_PASSWORD, registerAdmin, registerReader, uniqueEmail } from '../support/accounts';
import { testDataSource } from '../support/test-database';
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

    const res = await request(app).get('/api/admin/users').query({ q: reader.user.email }).set(bearer(admin.accessToken)).expect(200);

    const row = res.body.accounts.find((u: { id: string }) => u.id === reader.user.id);
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

  it('When an admin searches and pages 10,000 accounts, then the server answers one page of matches with the total', async () => {
    const admin = await registerAdmin(app);
    const dataSource = await testDataSource();
    const tag = `pg${Date.now().toString(36)}`;
    // 10,000 invented accounts straight into the table (registering each would take minutes).
    await dataSource.query(
      `INSERT INTO users (email, display_name, password_hash, role, created_at)
       SELECT $1 || '-' || n || '@example.test', 'Reader ' || n, 'x', 'reader', now() + n * interval '1 millisecond' FROM generate_series(1, 10000) AS n`,
      [tag],
    );

    const first = await request(app).get('/api/admin/users').query({ q: tag, page: 0, size: 50 }).set(bearer(admin.accessToken)).expect(200);
    expect(first.body.total).toBe(10_000);
    expect(first.body.accounts.length).toBe(50);
    // Oldest first: the first created is the first listed, the last created the last of page 199.
    expect(first.body.accounts[0].email).toBe(`${tag}-1@example.test`);

    const last = await request(app).get('/api/admin/users').query({ q: tag, page: 199, size: 50 }).set(bearer(admin.accessToken)).expect(200);
    expect(last.body.accounts.length).toBe(50);
    expect(last.body.accounts[49].email).toBe(`${tag}-10000@example.test`);
    expect(new Set([...first.body.accounts, ...last.body.accounts].map((u: { id: string }) => u.id)).size).toBe(100);

    // Case does not matter; LIKE's own wildcards are taken literally.
    const one = await request(app)
      .get('/api/admin/users')
      .query({ q: `${tag.toUpperCase()}-9999@` })
      .set(bearer(admin.accessToken))
      .expect(200);
    expect(one.body.accounts.map((u: { email: string }) => u.email)).toEqual([`${tag}-9999@example.test`]);
    const none = await request(app)
      .get('/api/admin/users')
      .query({ q: `${tag}%` })
      .set(bearer(admin.accessToken))
      .expect(200);
    expect(none.body.total).toBe(0);

    const bad = await request(app).get('/api/admin/users').query({ size: 5000 }).set(bearer(admin.accessToken)).expect(400);
    expect(bad.body.error.details).toEqual({ size: 'must be at most 200' });
    await dataSource.query(`DELETE FROM users WHERE email LIKE $1 || '-%'`, [tag]);
  }, 90_000); // ten thousand rows inserted: give a busy machine time

  it('When an admin empties the caught mail, then the inbox lists nothing', async () => {
    const admin = await registerAdmin(app);
    const emptiedAt = new Date().toISOString();
    const emptied = await request(app).delete('/api/admin/mail').set(bearer(admin.accessToken)).expect(200);
    expect(emptied.body.removed).toEqual(jasmine.any(Number));

    // Only mail caught after the emptying (another spec's, arriving late) may be there.
    const res = await request(app).get('/api/admin/mail').set(bearer(admin.accessToken)).expect(200);
    expect(res.body.filter((mail: { receivedAt: string }) => mail.receivedAt < emptiedAt)).toEqual([]);
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
