import request from 'supertest';

import { bearer, GOOD_PASSWORD, registerReader, uniqueEmail } from '../support/accounts';
import { createTestApp } from '../support/test-server';

const ANDROID_FIREFOX = 'Mozilla/5.0 (Android 14; Mobile; rv:128.0) Gecko/128.0 Firefox/128.0';

describe('/api/devices', () => {
  it('When a reader signs in on two devices, then both are listed, named from the user agent', async () => {
    const app = await createTestApp();
    const email = uniqueEmail();
    const laptop = await registerReader(app, { email });
    await request(app).post('/api/auth/login').set('User-Agent', ANDROID_FIREFOX).send({ email, password: GOOD_PASSWORD }).expect(200);

    const res = await request(app).get('/api/devices').set(bearer(laptop.accessToken)).expect(200);

    expect(res.body.length).toBe(2);
    expect(res.body.map((d: { name: string }) => d.name).sort()).toEqual(['Chrome on Linux', 'Firefox on Android']);
    expect(res.body.filter((d: { current: boolean }) => d.current).length).toBe(1);
    expect(res.body[0].lastSeenAt).toMatch(/^\d{4}-\d\d-\d\dT/);
  });

  it('When a reader renames a device, then the new name is kept; a bad name is a 400', async () => {
    const app = await createTestApp();
    const signedIn = await registerReader(app);
    const [device] = (await request(app).get('/api/devices').set(bearer(signedIn.accessToken))).body;

    const renamed = await request(app).patch(`/api/devices/${device.id}`).set(bearer(signedIn.accessToken)).send({ name: 'Kitchen tablet' }).expect(200);
    const bad = await request(app).patch(`/api/devices/${device.id}`).set(bearer(signedIn.accessToken)).send({ name: '' }).expect(400);

    expect(renamed.body.name).toBe('Kitchen tablet');
    expect(bad.body.error.details).toEqual({ name: 'Name is required' });
  });

  it('When a reader signs out a lost tablet, then its refresh token stops working', async () => {
    const app = await createTestApp();
    const email = uniqueEmail();
    const laptop = await registerReader(app, { email });
    const tablet = (await request(app).post('/api/auth/login').set('User-Agent', ANDROID_FIREFOX).send({ email, password: GOOD_PASSWORD })).body;
    const devices = (await request(app).get('/api/devices').set(bearer(laptop.accessToken))).body;
    const lost = devices.find((d: { current: boolean }) => !d.current);

    await request(app).delete(`/api/devices/${lost.id}`).set(bearer(laptop.accessToken)).expect(204);

    await request(app).post('/api/auth/refresh').send({ refreshToken: tablet.refreshToken }).expect(401);
    await request(app).get('/api/auth/me').set(bearer(laptop.accessToken)).expect(200);
  });

  it('When a reader names another reader’s device, then it is not found', async () => {
    const app = await createTestApp();
    const one = await registerReader(app);
    const other = await registerReader(app);
    const [theirs] = (await request(app).get('/api/devices').set(bearer(other.accessToken))).body;

    await request(app).delete(`/api/devices/${theirs.id}`).set(bearer(one.accessToken)).expect(404);
    await request(app).get('/api/auth/me').set(bearer(other.accessToken)).expect(200);
  });

  it('When a browser signs in again with its device id, then it keeps its one device entry and only the newest token works', async () => {
    const app = await createTestApp();
    const email = uniqueEmail();
    const laptop = await registerReader(app, { email });
    const tabletId = crypto.randomUUID();
    const signIn = () =>
      request(app).post('/api/auth/login').set('User-Agent', ANDROID_FIREFOX).send({ email, password: GOOD_PASSWORD, deviceId: tabletId }).expect(200);
    const first = (await signIn()).body;
    const second = (await signIn()).body;
    const third = (await signIn()).body;

    const devices = (await request(app).get('/api/devices').set(bearer(laptop.accessToken)).expect(200)).body;
    expect(devices.length).toBe(2);
    expect(devices.filter((d: { name: string }) => d.name === 'Firefox on Android').length).toBe(1);
    // The entry's earlier refresh tokens end with the new sign-in; the newest one rotates.
    await request(app).post('/api/auth/refresh').send({ refreshToken: first.refreshToken }).expect(401);
    await request(app).post('/api/auth/refresh').send({ refreshToken: second.refreshToken }).expect(401);
    await request(app).post('/api/auth/refresh').send({ refreshToken: third.refreshToken }).expect(200);
  });

  it('When another reader or a signed-out entry has the same device id, then a new entry is made', async () => {
    const app = await createTestApp();
    const email = uniqueEmail();
    const shared = crypto.randomUUID();
    const other = await registerReader(app);
    await request(app).post('/api/auth/login').send({ email: other.user.email, password: GOOD_PASSWORD, deviceId: shared }).expect(200);
    const mine = (await request(app).post('/api/auth/register').send({ email, password: GOOD_PASSWORD, displayName: 'Mira Holt', deviceId: shared }).expect(201))
      .body;
    const [entry] = (await request(app).get('/api/devices').set(bearer(mine.accessToken))).body;
    await request(app).post('/api/auth/logout').set(bearer(mine.accessToken)).send({ refreshToken: mine.refreshToken });
    const again = (await request(app).post('/api/auth/login').send({ email, password: GOOD_PASSWORD, deviceId: shared }).expect(200)).body;

    const devices = (await request(app).get('/api/devices').set(bearer(again.accessToken)).expect(200)).body;
    expect(devices.length).toBe(1);
    expect(devices[0].id).not.toBe(entry.id);
  });

  it('When a device id is not one a browser makes, then sign-in is a 400 naming the field', async () => {
    const app = await createTestApp();
    const email = uniqueEmail();
    await registerReader(app, { email });
    const res = await request(app).post('/api/auth/login').send({ email, password: GOOD_PASSWORD, deviceId: 'no spaces; or <tags>' }).expect(400);
    expect(Object.keys(res.body.error.details)).toEqual(['deviceId']);
  });
});
