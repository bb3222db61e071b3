import { randomUUID } from 'node:crypto';

import type { Express } from 'express';
import request from 'supertest';

import { MAX_CLOCK_AHEAD_MS } from '../../shared/sync/hlc';
import { mergeChanges } from '../../shared/sync/merge-changes';
import { bearer, GOOD_PASSWORD, registerAdmin, registerReader } from '../support/accounts';
import { asObject, fieldChange, SyncClient } from '../support/sync-client';
import { testDataSource } from '../support/test-database';
import { createTestApp, startTestServer, type RunningServer } from '../support/test-server';

const NOW = Date.now();

describe('/api/sync', () => {
  let server: RunningServer;
  let app: Express;

  beforeAll(async () => {
    server = await startTestServer();
    app = server.app;
  });
  afterAll(() => server.close());

  async function newReader() {
    const signedIn = await registerReader(app);
    return { ...signedIn, client: new SyncClient(server.baseUrl, signedIn.accessToken) };
  }

  describe('POST /api/sync/push', () => {
    it('When a batch is pushed, then it answers applied/duplicates/serverTime and a pull returns the values', async () => {
      const { client } = await newReader();
      const row = randomUUID();
      const changes = [
        fieldChange(row, 'title', 'The Lantern Keeper’s Daughter', { wall: NOW }),
        fieldChange(row, 'authors', ['Ottilie Brand', 'Saul Meridew'], { wall: NOW }),
        fieldChange(row, 'rating', 4.5, { wall: NOW }),
      ];

      const pushed = await client.push(changes);
      const { state } = await client.pullAll();

      expect(pushed.status).toBe(200);
      expect(pushed.body).toEqual({ applied: 3, duplicates: 0, superseded: 0, overwritten: [], serverTime: jasmine.stringMatching(/^\d{4}-\d\d-\d\dT/) });
      expect(asObject(state)).toEqual(asObject(mergeChanges(new Map(), changes)));
    });

    it('When the same batch is sent again, then it is a no-op counted as duplicates', async () => {
      const { client } = await newReader();
      const row = randomUUID();
      const batch = [fieldChange(row, 'title', 'Once', { wall: NOW }), fieldChange(row, 'status', 'reading', { wall: NOW })];
      await client.push(batch);
      const before = await client.pullAll();

      const again = await client.push(batch);
      const after = await client.pull(before.cursor);

      expect(again.body.applied).toBe(0);
      expect(again.body.duplicates).toBe(2);
      expect(after.changes).toEqual([]); // nothing new since the first push
    });

    it('When an older clock arrives after a newer one, then the older value loses and is reported superseded, not duplicate', async () => {
      const { client } = await newReader();
      const row = randomUUID();
      const newer = fieldChange(row, 'title', 'Newer title', { wall: NOW + 10, node: 'laptop' });
      await client.push([newer]);

      const older = fieldChange(row, 'title', 'Older title', { wall: NOW });
      const late = await client.push([older]);
      const { state } = await client.pullAll();

      expect(late.body).toEqual(jasmine.objectContaining({ applied: 0, duplicates: 0, superseded: 1, overwritten: [{ id: older.id, by: newer.hlc }] }));
      expect(state.get(`books/${row}/title`)?.value).toBe('Newer title');
    });

    it('When two clocks tie on wall time and counter, then the greater node id wins in either order', async () => {
      const one = await newReader();
      const two = await newReader();
      const row = randomUUID();
      const fromA = fieldChange(row, 'rating', 2, { wall: NOW, counter: 3, node: 'aaaa-tablet' });
      const fromB = fieldChange(row, 'rating', 5, { wall: NOW, counter: 3, node: 'bbbb-laptop' });

      await one.client.push([fromA]);
      await one.client.push([fromB]);
      await two.client.push([fromB]);
      await two.client.push([fromA]);

      expect((await one.client.pullAll()).state.get(`books/${row}/rating`)?.value).toBe(5);
      expect((await two.client.pullAll()).state.get(`books/${row}/rating`)?.value).toBe(5);
    });

    it('When rows arrive in pieces from several devices, then each field is accepted on its own', async () => {
      const { accessToken, client: tablet } = await newReader();
      const laptop = new SyncClient(server.baseUrl, accessToken);
      const row = randomUUID();

      await laptop.push([fieldChange(row, 'rating', 3.5, { wall: NOW, node: 'laptop' })]);
      await tablet.push([fieldChange(row, 'title', 'Harbour of Small Hours', { wall: NOW, node: 'tablet' })]);
      const { state } = await laptop.pullAll();

      expect(state.get(`books/${row}/rating`)?.value).toBe(3.5);
      expect(state.get(`books/${row}/title`)?.value).toBe('Harbour of Small Hours');
      expect(state.has(`books/${row}/format`)).toBeFalse();
    });

    it('When any change of a batch is invalid, then nothing of it is applied and each bad change is listed', async () => {
      const { client } = await newReader();
      const row = randomUUID();
      const batch = [
        fieldChange(row, 'title', 'Fine title', { wall: NOW }),
        fieldChange(row, 'rating', 7, { wall: NOW }),
        fieldChange(row, 'colour', 'blue', { wall: NOW }),
      ];

      const res = await client.push(batch);
      const { state } = await client.pullAll();

      expect(res.status).toBe(400);
      expect(res.body.error?.code).toBe('invalid_changes');
      expect(res.body.error?.details).toEqual([
        { index: 1, id: batch[1]!.id, code: 'invalid_value', reason: 'books.rating must be at most 5' },
        { index: 2, id: batch[2]!.id, code: 'unknown_field', reason: 'books has no field colour' },
      ]);
      expect(state.size).toBe(0);
    });

    it('When a clock is more than 24 h ahead of the server, then it answers 400 clock_ahead', async () => {
      const { client } = await newReader();

      const res = await client.push([fieldChange(randomUUID(), 'title', 'From the future', { wall: Date.now() + MAX_CLOCK_AHEAD_MS + 60_000 })]);

      expect(res.status).toBe(400);
      expect(res.body.error?.code).toBe('clock_ahead');
    });

    it('When a batch has more than 1,000 changes or more than 1 MiB, then it answers 413', async () => {
      const { client } = await newReader();
      const row = randomUUID();
      const many = Array.from({ length: 1001 }, (_, n) => fieldChange(row, 'title', `t${n}`, { wall: NOW, counter: n }));
      const huge = Array.from({ length: 5 }, (_, n) => fieldChange(randomUUID(), 'title', 'x'.repeat(250_000), { wall: NOW, counter: n }));

      expect((await client.push(many)).status).toBe(413);
      expect((await client.push(huge)).status).toBe(413);
    });

    it('When the envelope is wrong, then it answers 400 naming the field', async () => {
      const { accessToken } = await newReader();

      const res = await request(app).post('/api/sync/push').set(bearer(accessToken)).send({ changes: 'all of them' }).expect(400);

      expect(res.body.error.details).toEqual({ deviceId: 'deviceId is required', changes: 'changes must be a list' });
    });

    it('When nobody is signed in, then it answers 401', async () => {
      await request(app).post('/api/sync/push').send({ deviceId: 'x', changes: [] }).expect(401);
      await request(app).get('/api/sync/pull').expect(401);
    });
  });

  describe('GET /api/sync/pull', () => {
    it('When following cursors from the start in small pages, then the whole state arrives and rows are never split', async () => {
      const { client } = await newReader();
      const changes = Array.from({ length: 12 }, () => randomUUID()).flatMap((row, n) => [
        fieldChange(row, 'title', `Book ${n}`, { wall: NOW }),
        fieldChange(row, 'format', 'ebook', { wall: NOW }),
        fieldChange(row, 'status', 'tbr', { wall: NOW }),
      ]);
      await client.push(changes);

      const pages: string[][] = [];
      const remaining: (number | undefined)[] = [];
      let cursor: string | undefined;
      for (;;) {
        const page = await client.pull(cursor, 5);
        pages.push(page.changes.map((c) => c.rowId));
        remaining.push(page.remaining);
        cursor = page.cursor;
        if (!page.hasMore) break;
      }
      // Each page says how many of the 12 rows are still to come (none on the last, which has no more).
      const rowsSoFar = pages.map((_, n) => pages.slice(0, n + 1).reduce((sum, page) => sum + new Set(page).size, 0));
      expect(remaining).toEqual(rowsSoFar.map((sofar, n) => (n === pages.length - 1 ? undefined : 12 - sofar)));
      const { state } = await client.pullAll(undefined, 5);

      expect(asObject(state)).toEqual(asObject(mergeChanges(new Map(), changes)));
      expect(pages.every((rows) => rows.length <= 5)).toBeTrue();
      // each row's three fields come in the same page
      for (const rows of pages) for (const row of new Set(rows)) expect(rows.filter((r) => r === row).length).toBe(3);
    });

    it('When a row changes after a cursor, then only that row comes, with the current value of each field', async () => {
      const { client } = await newReader();
      const row = randomUUID();
      const untouched = randomUUID();
      await client.push([
        fieldChange(row, 'title', 'First', { wall: NOW }),
        fieldChange(row, 'status', 'tbr', { wall: NOW }),
        fieldChange(untouched, 'title', 'Left alone', { wall: NOW }),
      ]);
      const { cursor } = await client.pullAll();

      await client.push([fieldChange(row, 'status', 'reading', { wall: NOW + 1 }), fieldChange(row, 'status', 'finished', { wall: NOW + 2 })]);
      const page = await client.pull(cursor);

      expect(page.changes.map(({ rowId, field, value }) => ({ rowId, field, value }))).toEqual([
        { rowId: row, field: 'title', value: 'First' },
        { rowId: row, field: 'status', value: 'finished' },
      ]);
    });

    it('When a field holds a list of objects (jsonb), then it comes back exactly as sent, and null clears it', async () => {
      const { client } = await newReader();
      const row = randomUUID();
      const prompts = [
        { id: 'p1', text: 'A book set at sea', bookId: null },
        { id: 'p2', text: 'A debut', done: true, bookId: randomUUID() },
      ];
      await client.push([
        fieldChange(row, 'name', 'Prompts of 2026', { wall: NOW }, 'challenges'),
        fieldChange(row, 'kind', 'prompts', { wall: NOW }, 'challenges'),
        fieldChange(row, 'prompts', prompts, { wall: NOW }, 'challenges'),
      ]);
      expect((await client.pullAll()).state.get(`challenges/${row}/prompts`)?.value).toEqual(prompts);

      await client.push([fieldChange(row, 'prompts', null, { wall: NOW + 1 }, 'challenges')]);
      expect((await client.pullAll()).state.get(`challenges/${row}/prompts`)?.value).toBeNull();
    });

    it('When a book is deleted, then the tombstone syncs like any field', async () => {
      const { client } = await newReader();
      const row = randomUUID();
      await client.push([fieldChange(row, 'title', 'Gone soon', { wall: NOW })]);
      await client.push([fieldChange(row, 'deleted', true, { wall: NOW + 1 })]);

      expect((await client.pullAll()).state.get(`books/${row}/deleted`)?.value).toBeTrue();
    });

    it('When the cursor or limit is bad, then it answers 400 naming it', async () => {
      const { accessToken } = await newReader();

      const since = await request(app).get('/api/sync/pull?since=not-a-cursor').set(bearer(accessToken)).expect(400);
      const limit = await request(app).get('/api/sync/pull?limit=9000').set(bearer(accessToken)).expect(400);

      expect(Object.keys(since.body.error.details)).toEqual(['since']);
      expect(limit.body.error.details).toEqual({ limit: 'limit must be 1 to 5000' });
    });
  });

  describe('Isolation between readers', () => {
    it('When another reader writes to the same row id, then neither sees or touches the other’s fields', async () => {
      const ilse = await newReader();
      const bram = await newReader();
      const row = randomUUID();
      await ilse.client.push([fieldChange(row, 'title', 'Ilse’s book', { wall: NOW })]);

      await bram.client.push([fieldChange(row, 'title', 'Bram’s book', { wall: NOW + 100 }), fieldChange(row, 'rating', 1, { wall: NOW + 100 })]);

      const mine = asObject((await ilse.client.pullAll()).state);
      const theirs = asObject((await bram.client.pullAll()).state);
      expect(Object.keys(mine)).toEqual([`books/${row}/title`]);
      expect(mine[`books/${row}/title`]?.value).toBe('Ilse’s book');
      expect(theirs[`books/${row}/title`]?.value).toBe('Bram’s book');
    });
  });

  describe('Stored data and account deletion', () => {
    it('When a reader has synced, then admins see their stored size, and deleting the account removes the rows', async () => {
      const reader = await newReader();
      await reader.client.push([fieldChange(randomUUID(), 'title', 'A book with some weight to it', { wall: NOW })]);
      const admin = await registerAdmin(app);

      // The list is paged: search for the reader's address so they are on the first page.
      const users = (await request(app).get('/api/admin/users').query({ q: reader.user.email }).set(bearer(admin.accessToken)).expect(200)).body.accounts;
      expect(users.find((u: { id: string }) => u.id === reader.user.id).storedBytes).toBeGreaterThan(0);

      await request(app).delete('/api/auth/account').set(bearer(reader.accessToken)).send({ password: GOOD_PASSWORD }).expect(204);
      const left = await (await testDataSource()).query('SELECT count(*)::int AS n FROM books WHERE user_id = $1', [reader.user.id]);
      expect(left[0].n).toBe(0);
    });
  });

  it('serves the same API from createTestApp (supertest) as from a listening server', async () => {
    const inProcess = await createTestApp();
    const { accessToken } = await registerReader(inProcess);
    const res = await request(inProcess).get('/api/sync/pull').set(bearer(accessToken)).expect(200);
    expect(res.body).toEqual({ changes: [], cursor: jasmine.any(String), hasMore: false, serverTime: jasmine.any(String) });
  });
});
