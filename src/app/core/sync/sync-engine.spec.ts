import { provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';

import { formatHlc } from '@shared/sync/hlc';

import { Auth } from '../auth/auth';
import { authInterceptor } from '../auth/auth-interceptor';
import { READER, rememberSession } from '../auth/testing/session-fixtures';
import type { JournalDb } from '../data/journal-db';
import { JournalStore } from '../data/journal-store';
import { LiveQueryPace } from '../data/live-query-pace';
import { deviceId } from '../device/device-id';
import { SyncEngine } from './sync-engine';
import {
  emptyPage,
  expectNothingSent,
  NO_NETWORK,
  otherTabSyncing,
  pullPage,
  pushed,
  refusedBody,
  sent,
  SERVER_ERROR,
  UNAUTHORIZED,
  until,
} from './testing/sync-backend';
import { closeEngineTestBed, openEngineTestBed, type EngineTestBed } from './testing/engine-test-bed';

/**
 * The engine against the real pieces of this device — IndexedDB through Dexie, the auth
 * interceptor, Web Locks — with HttpTestingController as the server. Time is jasmine.clock
 * (timers and Date), while IndexedDB and locks run in real time; `until`/`sent` wait in real time.
 */
describe('SyncEngine', () => {
  let bed: EngineTestBed;
  let userId: string;
  let backend: HttpTestingController;
  let store: JournalStore;
  let db: JournalDb;
  let clock: jasmine.Clock;

  beforeEach(async () => {
    bed = await openEngineTestBed('sync');
    ({ userId, backend, clock, db } = bed);
    store = TestBed.inject(JournalStore);
  });

  afterEach(() => closeEngineTestBed({ ...bed, backend })); // a spec may start a fresh TestBed and backend

  /** The app starting: the engine is created and its start effect runs. */
  function start(): SyncEngine {
    const engine = TestBed.inject(SyncEngine);
    TestBed.tick();
    clock.tick(0);
    return engine;
  }

  /** Started, with the start sync done (nothing to push, nothing to pull). */
  async function startedAndIdle(): Promise<SyncEngine> {
    const engine = start();
    (await sent(backend, '/api/sync/pull')).flush(emptyPage('cursor-start'));
    await until(() => engine.phase() === 'idle', 'the start sync is done');
    return engine;
  }

  const outbox = () => db.outbox.orderBy('seq').toArray();

  /** The server's side of one round: it takes a push of `count` changes and has nothing to pull; resolves once the outbox is empty. */
  async function oneRoundPushing(count: number, what: string): Promise<void> {
    const push = await sent(backend, '/api/sync/push');
    expect((push.request.body as { changes: unknown[] }).changes.length).toBe(count);
    push.flush(pushed(count));
    (await sent(backend, '/api/sync/pull')).flush(emptyPage('cursor-2'));
    await until(async () => (await db.outbox.count()) === 0, what);
  }

  describe('a push and pull cycle', () => {
    it('sends the whole outbox with this device id, keeps it until the server confirms, then clears it', async () => {
      await store.create('books', { title: 'The Lantern Ferry', format: 'print', status: 'reading' });
      const queued = await outbox();
      expect(queued.length).toBe(4); // title, format, status and the deleted tombstone

      const engine = start();
      const push = await sent(backend, '/api/sync/push');
      expect(push.request.method).toBe('POST');
      expect(push.request.body).toEqual({ deviceId: deviceId(), changes: queued.map(({ seq: _seq, ...change }) => change) });
      expect(engine.phase()).toBe('syncing');
      expect(await db.outbox.count())
        .withContext('before the server answered')
        .toBe(4);

      push.flush(pushed(4));
      const pull = await sent(backend, '/api/sync/pull');
      expect(await db.outbox.count())
        .withContext('after the server confirmed')
        .toBe(0);
      pull.flush(emptyPage('cursor-1'));

      await until(() => engine.phase() === 'idle', 'the cycle is done');
      expect(engine.error()).toBeNull();
    });

    it('pushes at most 500 changes at a time, oldest first', async () => {
      const titles = Array.from({ length: 130 }, (_, n) => `Harbour Lights, volume ${n + 1}`);
      await store.writeAll(
        titles.map((title) => ({ collection: 'books', rowId: crypto.randomUUID(), patch: { title, format: 'ebook', status: 'tbr', deleted: false } })),
      );
      const queued = await outbox();
      expect(queued.length).toBe(520);

      start();
      const first = await sent(backend, '/api/sync/push');
      expect((first.request.body as { changes: { id: string }[] }).changes.map((change) => change.id)).toEqual(queued.slice(0, 500).map((change) => change.id));
      first.flush(pushed(500));
      const second = await sent(backend, '/api/sync/push');
      expect((second.request.body as { changes: { id: string }[] }).changes.map((change) => change.id)).toEqual(queued.slice(500).map((change) => change.id));
      second.flush(pushed(20));
      (await sent(backend, '/api/sync/pull')).flush(emptyPage('cursor-1'));

      await until(async () => (await db.outbox.count()) === 0, 'the outbox is empty');
    });

    it('pulls page after page, merges what other devices wrote and keeps the cursor for the next sync', async () => {
      const rowId = crypto.randomUUID();
      const otherDevice = (wall: number) => formatHlc({ wall, counter: 0, node: 'other-device' });
      const engine = start();

      const first = await sent(backend, '/api/sync/pull');
      expect(first.request.params.get('since')).toBeNull();
      expect(first.request.params.get('limit')).toBe('1000');
      first.flush(pullPage('cursor-1', [{ collection: 'books', rowId, field: 'title', value: 'Salt and Cedar', hlc: otherDevice(Date.now() - 5000) }], true));
      const second = await sent(backend, '/api/sync/pull');
      expect(second.request.params.get('since')).toBe('cursor-1');
      second.flush(pullPage('cursor-2', [{ collection: 'books', rowId, field: 'status', value: 'finished', hlc: otherDevice(Date.now() - 4000) }]));
      await until(() => engine.phase() === 'idle', 'the cycle is done');

      expect(await db.rows('books').get(rowId)).toEqual(jasmine.objectContaining({ title: 'Salt and Cedar', status: 'finished' }));
      expect((await db.meta.get('cursor'))?.value).toBe('cursor-2');
      expect((await db.meta.get('lastSyncedAt'))?.value).toBe(new Date(Date.now()).toISOString());

      void engine.syncNow();
      const next = await sent(backend, '/api/sync/pull');
      expect(next.request.params.get('since')).toBe('cursor-2');
      next.flush(emptyPage('cursor-2'));
      await until(() => engine.phase() === 'idle', 'the next cycle is done');
    });

    it('paces the screens’ live queries while a long pull stores pages, says how far it is, and stops pacing when it ends or fails', async () => {
      const paced: boolean[] = [];
      const watching = TestBed.inject(LiveQueryPace).paced.subscribe((value) => paced.push(value));
      const book = (n: number) => ({
        collection: 'books',
        rowId: crypto.randomUUID(),
        field: 'title',
        value: `Copper Fen ${n}`,
        hlc: formatHlc({ wall: Date.now() - 5000, counter: n, node: 'other-device' }),
      });
      const engine = start();

      (await sent(backend, '/api/sync/pull')).flush({ ...pullPage('cursor-1', [book(1)], true), remaining: 2 });
      await until(() => paced.at(-1) === true, 'pacing begins after the first page');
      expect(engine.pullProgress()).toEqual({ rows: 1, aboutTotal: 3 });
      (await sent(backend, '/api/sync/pull')).flush({ ...pullPage('cursor-2', [book(2)], true), remaining: 1 });
      await until(() => engine.pullProgress()?.rows === 2, 'the second page is stored');
      expect(paced.at(-1)).toBeTrue();
      (await sent(backend, '/api/sync/pull')).flush(pullPage('cursor-3', [book(3)]));
      await until(() => engine.phase() === 'idle', 'the cycle is done');
      expect(paced).toEqual([false, true, false]);
      expect(await db.rows('books').count()).toBe(3);

      void engine.syncNow();
      (await sent(backend, '/api/sync/pull')).flush({ ...pullPage('cursor-4', [book(4)], true), remaining: 2 });
      await until(() => paced.at(-1) === true, 'pacing again');
      (await sent(backend, '/api/sync/pull')).flush({ error: { code: 'internal', message: 'Down', details: null } }, SERVER_ERROR);
      await until(() => engine.phase() === 'retrying', 'the pull failed');
      expect(paced.at(-1)).withContext('a failed pull paces nothing').toBeFalse();
      watching.unsubscribe();
    });

    it('keeps the offset from the server’s time a pull answered, saved with its page, and says once that the date looks wrong', async () => {
      const day = 86_400_000;
      const engine = start();
      (await sent(backend, '/api/sync/pull')).flush({ ...emptyPage('cursor-1'), serverTime: new Date(Date.now() + 3 * day).toISOString() });
      await until(() => engine.phase() === 'idle', 'the cycle is done');

      expect(Number((await db.meta.get('clockOffset'))?.value) / day).toBeCloseTo(3, 3);
      expect((await db.meta.get('cursor'))?.value).toBe('cursor-1');
      expect(engine.clockNotice()).toContain('about 3 days behind');
    });

    it('moves a change the server refuses for good to the refused list with its reason, and sends the rest again', async () => {
      await store.create('books', { title: 'A Winter in Tolvik' });
      const [deleted, title] = (await outbox()).sort((a, b) => a.field.localeCompare(b.field));
      const queued = await outbox();
      const titleIndex = queued.findIndex((change) => change.id === title!.id);

      const engine = start();
      (await sent(backend, '/api/sync/push')).flush(
        refusedBody([{ index: titleIndex, code: 'invalid_value', reason: 'books.title must be at most 500 characters' }]),
        {
          status: 400,
          statusText: 'Bad Request',
        },
      );
      const again = await sent(backend, '/api/sync/push');
      expect((again.request.body as { changes: { id: string }[] }).changes.map((change) => change.id)).toEqual([deleted!.id]);
      again.flush(pushed(1));
      (await sent(backend, '/api/sync/pull')).flush(emptyPage('cursor-1'));
      await until(() => engine.phase() === 'idle', 'the cycle is done');

      expect(await db.outbox.count()).toBe(0);
      expect(await db.rejected.toArray()).toEqual([
        jasmine.objectContaining({
          id: title!.id,
          field: 'title',
          value: 'A Winter in Tolvik',
          code: 'invalid_value',
          reason: 'books.title must be at most 500 characters',
        }),
      ]);
    });
  });

  describe('a refused sign-in', () => {
    it('pauses sync: the reader is asked to sign in again, the outbox is untouched and nothing restarts it', async () => {
      await store.create('books', { title: 'Nine Bells for Orla' });
      const before = await outbox();
      const engine = start();

      (await sent(backend, '/api/sync/push')).flush({ error: { code: 'token_expired', message: 'Token expired', details: null } }, UNAUTHORIZED);
      (await sent(backend, '/api/auth/refresh')).flush(
        { error: { code: 'refresh_revoked', message: 'This device was signed out; sign in again', details: null } },
        UNAUTHORIZED,
      );
      await until(() => engine.phase() === 'needs-sign-in', 'sync is paused');

      expect(TestBed.inject(Auth).needsSignIn()).toBe('This device was signed out; sign in again');
      expect(await outbox()).toEqual(before);
      // Neither a backoff, the periodic timer, coming online nor a new write starts it again.
      globalThis.dispatchEvent(new Event('online'));
      await store.write('books', before[0]!.rowId, { status: 'reading' });
      clock.tick(120_000);
      await expectNothingSent(backend);
      expect(engine.phase()).toBe('needs-sign-in');
      expect(await db.outbox.count()).toBe(before.length + 1);
    });

    it('does not start at all while the reader still has to sign in again', async () => {
      rememberSession({ user: { ...READER, id: userId }, needsSignIn: 'Sign in again to sync' });
      TestBed.resetTestingModule();
      TestBed.configureTestingModule({ providers: [provideHttpClient(withInterceptors([authInterceptor])), provideHttpClientTesting()] });
      backend = TestBed.inject(HttpTestingController);

      const engine = start();
      await engine.syncNow();
      await expectNothingSent(backend);
      expect(engine.phase()).toBe('needs-sign-in');
    });
  });

  describe('triggers', () => {
    it('syncs on start', async () => {
      const engine = start();
      const pull = await sent(backend, '/api/sync/pull');
      expect(engine.phase()).toBe('syncing');
      pull.flush(emptyPage('cursor-1'));
      await until(() => engine.phase() === 'idle', 'the start sync is done');
    });

    it('syncs when the browser comes back online, and shows offline when it goes', async () => {
      const engine = await startedAndIdle();

      globalThis.dispatchEvent(new Event('offline'));
      expect(engine.phase()).toBe('offline');
      globalThis.dispatchEvent(new Event('online'));
      clock.tick(0);

      (await sent(backend, '/api/sync/pull')).flush(emptyPage('cursor-2'));
      await until(() => engine.phase() === 'idle', 'the sync is done');
    });

    it('syncs 1.5 s after the last local write, not sooner', async () => {
      await startedAndIdle();
      const id = await store.create('books', { title: 'The Paper Lighthouse' });
      clock.tick(1000);
      await store.write('books', id, { status: 'reading' }); // a second write starts the wait again

      clock.tick(1499);
      await expectNothingSent(backend);
      clock.tick(1);
      clock.tick(0);
      await oneRoundPushing(3, 'the writes are pushed');
    });

    it('holds rounds back while a bulk import writes, then sends all of it in one round', async () => {
      const engine = await startedAndIdle();
      let release!: () => void;
      const held = engine.holdWhile(async () => {
        await store.create('books', { title: 'The Paper Lighthouse' });
        await new Promise<void>((resolve) => (release = resolve));
      });
      await until(() => release !== undefined, 'the import is writing');
      clock.tick(1500);
      clock.tick(0);
      await engine.syncNow(); // even "Sync now" waits for the import
      await expectNothingSent(backend);
      await until(async () => (await db.outbox.count()) === 2, 'the write is in the outbox');
      TestBed.tick();
      expect(engine.pending()).withContext('the outbox is not re-counted per batch of an import').toBe(0);
      release();
      await held;
      clock.tick(0);
      await until(() => {
        TestBed.tick();
        clock.tick(0);
        return engine.pending() === 2;
      }, 'the outbox counted again once the import is done');
      await oneRoundPushing(2, 'the import is pushed');
    });

    it('looks for other devices’ changes every minute while the page is visible', async () => {
      await startedAndIdle();

      clock.tick(59_999);
      await expectNothingSent(backend);
      clock.tick(1);
      clock.tick(0);
      (await sent(backend, '/api/sync/pull')).flush(emptyPage('cursor-2'));
    });

    it('skips the periodic sync while the page is hidden', async () => {
      const engine = await startedAndIdle();
      spyOnProperty(document, 'visibilityState').and.returnValue('hidden');

      clock.tick(60_000);
      clock.tick(0);
      await expectNothingSent(backend);
      expect(engine.phase()).toBe('idle');
    });
  });

  describe('after a failure', () => {
    /** Fails the pending pull with `status` and waits until the engine has taken it in. */
    async function failPull(engine: SyncEngine, status: { status: number; statusText: string }, phase: string): Promise<void> {
      const pull = await sent(backend, '/api/sync/pull');
      if (status.status === 0) pull.error(new ProgressEvent('error'), status);
      else pull.flush({ error: { code: 'internal', message: 'Something broke', details: null } }, status);
      await until(() => engine.phase() === phase, `the engine shows ${phase}`);
    }

    /** Checks that the next attempt comes `ms` after the failure, and not a millisecond sooner. */
    async function nextAttemptAfter(ms: number): Promise<void> {
      clock.tick(ms - 1);
      await expectNothingSent(backend);
      clock.tick(1);
    }

    // retryDelayMs with Math.random() = 0.5: half the ceiling plus half of the other half, where
    // the ceiling doubles from 1 s (1000 → 750, 2000 → 1500, 4000 → 3000).
    beforeEach(() => spyOn(Math, 'random').and.returnValue(0.5));

    it('waits the backoff before each retry, longer each time, and starts over after a success', async () => {
      const engine = start();
      await failPull(engine, SERVER_ERROR, 'retrying');
      expect(engine.error()).toBe('The server answered 500; trying again shortly');

      await nextAttemptAfter(750);
      await failPull(engine, SERVER_ERROR, 'retrying');
      await nextAttemptAfter(1500);
      await failPull(engine, SERVER_ERROR, 'retrying');
      await nextAttemptAfter(3000);
      (await sent(backend, '/api/sync/pull')).flush(emptyPage('cursor-1'));
      await until(() => engine.phase() === 'idle', 'the retry succeeded');
      expect(engine.error()).toBeNull();

      globalThis.dispatchEvent(new Event('online'));
      clock.tick(0);
      await failPull(engine, SERVER_ERROR, 'retrying');
      await nextAttemptAfter(750);
      (await sent(backend, '/api/sync/pull')).flush(emptyPage('cursor-2'));
      await until(() => engine.phase() === 'idle', 'the retry succeeded');
    });

    it('calls an unreachable server offline, without an error, and backs off the same way', async () => {
      await store.create('books', { title: 'Lowland Hours' });
      const engine = start();
      const push = await sent(backend, '/api/sync/push');
      push.error(new ProgressEvent('error'), NO_NETWORK);
      await until(() => engine.phase() === 'offline', 'the engine shows offline');
      expect(engine.error()).toBeNull();
      expect(await db.outbox.count()).toBe(2);

      await nextAttemptAfter(750);
      // While offline each attempt is one cheap probe, not the push; the service worker's answer
      // when the network is down is a 504 without our error body.
      (await sent(backend, '/api/health')).flush('', { status: 504, statusText: 'Gateway Timeout' });
      await until(() => engine.phase() === 'offline', 'the engine shows offline');
      expect(engine.error()).toBeNull();
      await nextAttemptAfter(1500);
      (await sent(backend, '/api/health')).flush({ status: 'ok' });
      (await sent(backend, '/api/sync/push')).flush(pushed(2));
      (await sent(backend, '/api/sync/pull')).flush(emptyPage('cursor-1'));
      await until(() => engine.phase() === 'idle', 'the retry succeeded');
    });

    it('"Sync now" goes at once, without waiting out the backoff', async () => {
      const engine = start();
      await failPull(engine, SERVER_ERROR, 'retrying');

      void engine.syncNow();
      (await sent(backend, '/api/sync/pull')).flush(emptyPage('cursor-1'));
      await until(() => engine.phase() === 'idle', 'the sync is done');
      expect(engine.phase()).toBe('idle');
    });
  });

  describe('one tab at a time (Web Locks)', () => {
    it('holds this reader’s sync lock while it syncs, and lets it go afterwards', async () => {
      const engine = start();
      const pull = await sent(backend, '/api/sync/pull');
      const held = (await navigator.locks.query()).held?.map((lock) => lock.name) ?? [];
      expect(held).toContain(`lamplight-sync-${userId}`);

      pull.flush(emptyPage('cursor-1'));
      await until(() => engine.phase() === 'idle', 'the sync is done');
      expect((await navigator.locks.query()).held?.map((lock) => lock.name) ?? []).not.toContain(`lamplight-sync-${userId}`);
    });

    it('leaves the sync to the tab holding the lock, and looks again after a short wait', async () => {
      spyOn(Math, 'random').and.returnValue(0.5);
      await store.create('books', { title: 'The Orchard Ledger' });
      const otherTab = await otherTabSyncing(userId);

      const engine = start();
      expect(engine.phase()).toBe('syncing');
      await until(() => engine.phase() === 'idle', 'the engine gave way');
      await expectNothingSent(backend);
      expect(await db.outbox.count()).toBe(2);

      await otherTab.release();
      clock.tick(749);
      await expectNothingSent(backend);
      clock.tick(1);
      (await sent(backend, '/api/sync/push')).flush(pushed(2));
      (await sent(backend, '/api/sync/pull')).flush(emptyPage('cursor-1'));
      await until(() => engine.phase() === 'idle', 'the sync is done');
    });
  });
});
