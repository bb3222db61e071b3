import { randomUUID } from 'node:crypto';

import request from 'supertest';

import { COLLECTIONS } from '../../shared/sync/schema/collections';
import { BatchedCountStore } from '../../sync-server/src/data-access/batched-count-store';
import { SyncStore } from '../../sync-server/src/data-access/sync-store';
import { ACCESS_TOKEN_SECONDS, VerifiedTokens } from '../../sync-server/src/domain/access-tokens';
import { bearer, registerReader } from '../support/accounts';
import { fieldChange, SyncClient } from '../support/sync-client';
import { testDataSource } from '../support/test-database';
import { createTestApp, startTestServer, type RunningServer } from '../support/test-server';

const SECRET = new TextEncoder().encode('spec-secret-that-is-at-least-32-characters-long');

describe('The sync hot paths (issue 23: cheap empty pulls and small pushes)', () => {
  let server: RunningServer;
  beforeAll(async () => (server = await startTestServer()));
  afterAll(() => server.close());

  describe('an empty pull', () => {
    it('When the cursor is up to date, then nothing comes back and the same cursor is handed back', async () => {
      const { accessToken } = await registerReader(server.app);
      const client = new SyncClient(server.baseUrl, accessToken);
      await client.push([fieldChange(randomUUID(), 'title', 'A quiet evening', { wall: Date.now() })]);
      const { cursor } = await client.pullAll();

      const again = await client.pull(cursor);

      expect([again.changes.length, again.hasMore, again.cursor]).toEqual([0, false, cursor]);
    });

    it('When another device changed the last collection after the cursor, then the quick check sees it, with prepared or unnamed statements', async () => {
      const { accessToken, user } = await registerReader(server.app);
      const client = new SyncClient(server.baseUrl, accessToken);
      await client.push([fieldChange(randomUUID(), 'title', 'A first book', { wall: Date.now() })]);
      const { cursor } = await client.pullAll();
      const last = Object.values(COLLECTIONS).at(-1)!;
      expect(last.name).toBe('readerSettings');
      await client.push([fieldChange(randomUUID(), 'theme', 'system', { wall: Date.now() + 1 }, last.name)]);

      const page = await client.pull(cursor);
      const dataSource = await testDataSource();
      const position = (await dataSource.query(`SELECT min(seq)::int - 1 AS seq FROM reader_settings WHERE user_id = $1`, [user.id]))[0].seq as number;
      const unnamed = await new SyncStore(dataSource, { namedStatements: false }).pull(user.id, position, 100);

      expect(page.changes.map((change) => [change.collection, change.field])).toContain(['readerSettings', 'theme']);
      expect(unnamed.changes.map((change) => change.field)).toContain('theme');
    });
  });

  describe('requireAuth', () => {
    it('When another instance revokes the device in the database, then this one refuses the token within LAMPLIGHT_SESSION_CHECK_MS', async () => {
      const app = await createTestApp({ LAMPLIGHT_SESSION_CHECK_MS: '300' });
      const reader = await registerReader(app);
      await request(app).get('/api/sync/pull').set(bearer(reader.accessToken)).expect(200);
      // Another instance's sign-out: the row changes, this process is not told.
      await (await testDataSource()).query(`UPDATE device_sessions SET revoked_at = now() WHERE user_id = $1`, [reader.user.id]);

      const soon = await request(app).get('/api/sync/pull').set(bearer(reader.accessToken));
      await new Promise((resolve) => setTimeout(resolve, 400));
      const later = await request(app).get('/api/sync/pull').set(bearer(reader.accessToken));

      expect(soon.status).toBe(200); // remembered for at most 300 ms
      expect([later.status, later.body.error.code]).toEqual([401, 'session_revoked']);
    });

    it('When this instance signs the device out, then its token is refused at once, though it was just remembered', async () => {
      const app = await createTestApp({ LAMPLIGHT_SESSION_CHECK_MS: '60000' });
      const reader = await registerReader(app);
      await request(app).get('/api/sync/pull').set(bearer(reader.accessToken)).expect(200);

      await request(app).post('/api/auth/logout').set(bearer(reader.accessToken)).send({}).expect(204);
      const after = await request(app).get('/api/sync/pull').set(bearer(reader.accessToken));

      expect([after.status, after.body.error?.code]).toEqual([401, 'session_revoked']);
    });

    it('When a remembered token expires, or one byte of it changes, then it is refused (RFC 7519 §4.1.4 exp; RFC 7515 signature)', async () => {
      const { accessToken } = await registerReader(server.app);
      const tokens = new VerifiedTokens(SECRET);
      const now = Date.now();
      const first = await tokens.verify(accessToken, now);
      const altered = accessToken.slice(0, -2) + (accessToken.endsWith('AA') ? 'BB' : 'AA');

      expect(first.ok).toBeTrue();
      expect(await tokens.verify(accessToken, now + (ACCESS_TOKEN_SECONDS + 1) * 1000)).toEqual({ ok: false, reason: 'expired' });
      expect(await tokens.verify(altered, now)).toEqual({ ok: false, reason: 'invalid' });
    });
  });

  describe('the sync limit (BatchedCountStore)', () => {
    it("When two instances count one reader, then each learns the other's hits when it next sends its own, and a new window starts from zero", async () => {
      const dataSource = await testDataSource();
      const prefix = `spec-${randomUUID().slice(0, 8)}`;
      const one = new BatchedCountStore(dataSource, prefix, 60_000);
      const two = new BatchedCountStore(dataSource, prefix, 60_000);
      for (const store of [one, two]) store.init({ windowMs: 60_000 } as never);
      const reader = randomUUID();
      try {
        await one.increment(reader);
        await one.increment(reader);
        await two.increment(reader);
        expect((await two.increment(reader)).totalHits).toBe(2); // not flushed yet: its own hits only
        await one.flush();
        await two.flush();
        expect((await one.increment(reader)).totalHits).toBe(3); // learns the others' hits when it sends its own
        await one.flush();

        expect((await one.increment(reader)).totalHits).toBe(6);
        await dataSource.query(`UPDATE attempt_counts SET reset_at = now() - interval '1 second' WHERE key LIKE $1`, [`${prefix}.%`]);
        const fresh = new BatchedCountStore(dataSource, prefix, 60_000);
        fresh.init({ windowMs: 60_000 } as never);
        await fresh.increment(reader);
        await fresh.flush(); // the expired row starts over at this flush's one hit
        expect((await fresh.increment(reader)).totalHits).toBe(2);
        fresh.stop();
      } finally {
        one.stop();
        two.stop();
      }
    });
  });
});
