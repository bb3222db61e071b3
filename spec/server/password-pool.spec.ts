import request from 'supertest';

import { BUSY_RETRY_SECONDS } from '../../sync-server/src/domain/passwords';
import { GOOD_PASSWORD, registerReader } from '../support/accounts';
import { createTestApp } from '../support/test-server';

describe('Password hashing in a bounded worker pool', () => {
  it('When more sign-ins arrive than the threads and queue can hold, then the extra ones get 503 with Retry-After', async () => {
    // One thread, one queue place, and a slow hash, so six sign-ins at once cannot all fit.
    const app = await createTestApp({ LAMPLIGHT_HASH_THREADS: '1', LAMPLIGHT_HASH_QUEUE: '1', LAMPLIGHT_BCRYPT_COST: '11' });
    const { user } = await registerReader(app);

    const answers = await Promise.all(Array.from({ length: 6 }, () => request(app).post('/api/auth/login').send({ email: user.email, password: GOOD_PASSWORD })));

    const statuses = answers.map((res) => res.status);
    expect(statuses).toContain(200);
    expect(statuses).toContain(503);
    expect(statuses.every((status) => status === 200 || status === 503))
      .withContext(statuses.join(','))
      .toBeTrue();
    const busy = answers.find((res) => res.status === 503)!;
    expect(busy.body.error.code).toBe('busy');
    expect(busy.headers['retry-after']).toBe(String(BUSY_RETRY_SECONDS));
  });

  it('When the pool is not full, then hashing and checking a password work from the worker thread', async () => {
    const app = await createTestApp();
    const { user } = await registerReader(app);

    await request(app).post('/api/auth/login').send({ email: user.email, password: GOOD_PASSWORD }).expect(200);
    await request(app).post('/api/auth/login').send({ email: user.email, password: 'something else entirely' }).expect(401);
  });
});
