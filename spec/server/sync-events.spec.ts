import { randomUUID } from 'node:crypto';

import { registerReader } from '../support/accounts';
import { fieldChange, SyncClient } from '../support/sync-client';
import { SyncEventStream } from '../support/sync-event-stream';
import { testDataSource } from '../support/test-database';
import { startTestServer, type RunningServer } from '../support/test-server';

/**
 * Live updates: two server instances on one PostgreSQL, each with its own LISTEN connection,
 * as behind a load balancer. Event-stream framing as the WHATWG HTML standard, §9.2 "Server-sent
 * events", defines it (checked by the independent eventsource-parser package).
 */
describe('Live sync events across two server instances', () => {
  let first: RunningServer;
  let second: RunningServer;
  const streams: SyncEventStream[] = [];
  const open = async (...args: Parameters<typeof SyncEventStream.open>) => {
    const stream = await SyncEventStream.open(...args);
    streams.push(stream);
    return stream;
  };

  beforeAll(async () => {
    [first, second] = await Promise.all([startTestServer(), startTestServer({ env: { LAMPLIGHT_SYNC_HEARTBEAT_MS: '150' } })]);
  });
  afterEach(() => streams.splice(0).forEach((stream) => stream.close()));
  afterAll(async () => {
    await first.close();
    await second.close();
  });

  it('When a device pushes through one instance, then a stream on the other is poked within a second, after the commit', async () => {
    const reader = await registerReader(first.app);
    const stream = await open(second.baseUrl, reader.accessToken);
    expect(stream.status).toBe(200);
    const hello = await stream.nextSync(0);
    expect(hello.id).toMatch(/^[A-Za-z0-9_-]{40,}$/); // sealed: no server-wide counter in clear
    const seen = stream.events.length;

    const row = randomUUID();
    const pushedAt = performance.now();
    const push = await new SyncClient(first.baseUrl, reader.accessToken).push([fieldChange(row, 'title', 'The Salt Orchard', { wall: Date.now() })]);
    expect(push.status).toBe(200);
    const poke = await stream.nextSync(seen, 2000);

    expect(poke.at - pushedAt).toBeLessThan(1000);
    expect(poke.id).not.toBe(hello.id);
    expect(poke.id).not.toMatch(/^\d+$/);
    expect(JSON.parse(poke.data)).toEqual({});
    // The NOTIFY is part of the push's transaction: by the time the poke arrives, a pull sees the change.
    const pulled = await new SyncClient(second.baseUrl, reader.accessToken).pullAll();
    expect(pulled.state.get(`books/${row}/title`)?.value).toBe('The Salt Orchard');
  });

  it('When another reader pushes, then this reader’s stream stays quiet', async () => {
    const [mine, theirs] = await Promise.all([registerReader(first.app), registerReader(first.app)]);
    const stream = await open(second.baseUrl, mine.accessToken);
    await stream.nextSync(0);
    const seen = stream.events.length;
    await new SyncClient(first.baseUrl, theirs.accessToken).push([fieldChange(randomUUID(), 'title', 'Not Yours', { wall: Date.now() })]);
    // Our own push afterwards: the first sync event must be for it, not for the other reader's.
    await new SyncClient(first.baseUrl, mine.accessToken).push([fieldChange(randomUUID(), 'title', 'Yours', { wall: Date.now() })]);
    await stream.nextSync(seen);
    expect(stream.events.slice(seen).filter((e) => e.event === 'sync').length).toBe(1);
  });

  it('When a push changes nothing (a re-sent batch), then no stream is poked', async () => {
    const reader = await registerReader(first.app);
    const client = new SyncClient(first.baseUrl, reader.accessToken);
    const batch = [fieldChange(randomUUID(), 'title', 'Once Only', { wall: Date.now() })];
    await client.push(batch);
    const stream = await open(second.baseUrl, reader.accessToken);
    await stream.nextSync(0);
    const seen = stream.events.length;
    expect((await client.push(batch)).body.applied).toBe(0);
    await new Promise((resolve) => setTimeout(resolve, 400));
    expect(stream.events.length).toBe(seen);
  });

  it('When the stream is asked for without a valid bearer token, then it is refused with 401', async () => {
    expect((await open(second.baseUrl, null)).status).toBe(401);
    expect((await open(second.baseUrl, 'not.a.token')).status).toBe(401);
    const reader = await registerReader(first.app);
    const [header, payload] = reader.accessToken.split('.');
    expect((await open(second.baseUrl, `${header}.${payload}.forged-signature`)).status).toBe(401);
  });

  it('When a stream is open, then it is unbuffered, uncompressed and sends heartbeat comments', async () => {
    const reader = await registerReader(first.app);
    const stream = await open(second.baseUrl, reader.accessToken);
    expect(stream.headers.get('content-type')).toMatch(/^text\/event-stream/);
    expect(stream.headers.get('x-accel-buffering')).toBe('no');
    expect(stream.headers.get('cache-control')).toContain('no-transform');
    expect(stream.headers.get('content-encoding')).toBeNull();
    // This instance beats every 150 ms (LAMPLIGHT_SYNC_HEARTBEAT_MS); the default is 25 s.
    await stream.until((s) => s.comments.filter((c) => c.includes('heartbeat')).length >= 2, 3000);
    expect(stream.ended).toBeFalse();
  });

  it('When a device reconnects with Last-Event-ID, then it is poked only if something changed while it was away', async () => {
    const reader = await registerReader(first.app);
    const client = new SyncClient(first.baseUrl, reader.accessToken);
    await client.push([fieldChange(randomUUID(), 'title', 'Before', { wall: Date.now() })]);
    const before = await open(second.baseUrl, reader.accessToken);
    const seenId = (await before.nextSync(0)).id!;
    before.close();

    // Nothing changed: the reconnect is quiet (heartbeats only).
    const quiet = await open(second.baseUrl, reader.accessToken, { lastEventId: seenId });
    await quiet.until((s) => s.comments.length >= 2, 3000);
    expect(quiet.events.filter((e) => e.event === 'sync')).toEqual([]);
    quiet.close();

    // A push while away: the reconnect is poked at once with the newer id.
    await client.push([fieldChange(randomUUID(), 'title', 'While Away', { wall: Date.now() })]);
    const back = await open(second.baseUrl, reader.accessToken, { lastEventId: seenId });
    expect((await back.nextSync(0, 2000)).id).not.toBe(seenId);

    // A malformed Last-Event-ID counts as a fresh start, not an error.
    const odd = await open(second.baseUrl, reader.accessToken, { lastEventId: 'yesterday' });
    expect(odd.status).toBe(200);
    expect((await odd.nextSync(0)).id).toBeDefined();
  });

  it('When the listening connection is cut, then the instance reconnects and pokes its streams about what it missed', async () => {
    const reader = await registerReader(first.app);
    const stream = await open(second.baseUrl, reader.accessToken);
    await stream.nextSync(0);
    const seen = stream.events.length;
    const db = await testDataSource();
    const cut: unknown[] = await db.query(`SELECT pg_terminate_backend(pid) FROM pg_stat_activity WHERE application_name = 'lamplight-sync-listener'`);
    expect(cut.length).toBeGreaterThanOrEqual(1);
    // Pushed while no instance listens: its NOTIFY reaches nobody.
    await new SyncClient(first.baseUrl, reader.accessToken).push([fieldChange(randomUUID(), 'title', 'In The Gap', { wall: Date.now() })]);
    await stream.nextSync(seen, 8000);
    const listeners: unknown[] = await db.query(`SELECT pid FROM pg_stat_activity WHERE application_name = 'lamplight-sync-listener'`);
    expect(listeners.length).toBeGreaterThanOrEqual(1);
  });

  it('When a reader already has 20 streams on an instance, then another is refused with 429 and the others stay open', async () => {
    const reader = await registerReader(first.app);
    const open20 = await Promise.all(Array.from({ length: 20 }, () => open(second.baseUrl, reader.accessToken)));
    expect(open20.map((s) => s.status)).toEqual(Array(20).fill(200));
    await Promise.all(open20.map((s) => s.nextSync(0)));
    expect((await open(second.baseUrl, reader.accessToken)).status).toBe(429);
    // Another instance counts its own streams.
    expect((await open(first.baseUrl, reader.accessToken)).status).toBe(200);
    open20[0]!.close();
    await new Promise((resolve) => setTimeout(resolve, 200));
    expect((await open(second.baseUrl, reader.accessToken)).status).toBe(200);
  });

  it('When many streams are open on one instance, then it still uses one listening connection', async () => {
    const readers = await Promise.all([registerReader(first.app), registerReader(first.app)]);
    for (const reader of readers) for (let n = 0; n < 5; n++) await open(second.baseUrl, reader.accessToken);
    await Promise.all(streams.map((s) => s.nextSync(0)));
    const rows: { n: number }[] = await (
      await testDataSource()
    ).query(`SELECT count(*)::int AS n FROM pg_stat_activity WHERE application_name = 'lamplight-sync-listener'`);
    // One per instance at most: the second has streams; the first may still hold its idle one.
    expect(rows[0]!.n).toBeLessThanOrEqual(2);
    expect(rows[0]!.n).toBeGreaterThanOrEqual(1);
  });
});
