import { provideHttpClient } from '@angular/common/http';
import { TestBed } from '@angular/core/testing';
import Dexie from 'dexie';

import type { Session, Timer } from '@shared/sync/schema/collections';

import { forgetSession, READER, rememberSession } from '../../core/auth/testing/session-fixtures';
import { journalDbName } from '../../core/data/journal-db';
import { JournalStore } from '../../core/data/journal-store';
import { LocalJournal } from '../../core/data/local-journal';
import { deviceId } from '../../core/device/device-id';
import { CLOCK } from '../../core/time/clock';
import { ReadingTimer, sessionIdOf, TIMER_ROW_ID } from './reading-timer';
import { FakeClock } from './testing/fake-clock';
import { until } from './testing/until';

const MINUTE = 60_000;

/** Real IndexedDB in Chromium, one fresh database per spec; time from a fake clock. */
describe('ReadingTimer', () => {
  let userId: string;
  let clock: FakeClock;
  let store: JournalStore;
  let timer: ReadingTimer;

  function configure(): void {
    TestBed.configureTestingModule({ providers: [provideHttpClient(), { provide: CLOCK, useValue: clock }] });
    store = TestBed.inject(JournalStore);
    timer = TestBed.inject(ReadingTimer);
    TestBed.inject(LocalJournal);
  }

  beforeEach(() => {
    userId = `spec-${crypto.randomUUID()}`;
    rememberSession({ user: { ...READER, id: userId } });
    clock = new FakeClock(Date.parse('2026-03-08T20:14:00Z'));
    configure();
  });

  afterEach(async () => {
    TestBed.resetTestingModule();
    await Dexie.delete(journalDbName(userId));
    forgetSession();
  });

  const row = async () => (await store.get('timers', TIMER_ROW_ID)) as Timer | undefined;
  const sessions = async () => (await store.list('sessions')) as Session[];

  async function book(fields: Record<string, unknown> = {}): Promise<string> {
    return store.create('books', { title: 'The Cartographer of Tides', format: 'print', status: 'reading', pageCount: 320, ...fields });
  }

  it('stores the start, and computes elapsed time from it, ticking every second for the display', async () => {
    const bookId = await book();
    await store.create('sessions', { bookId, startedAt: '2026-03-07T20:00:00.000Z', endedAt: '2026-03-07T20:30:00.000Z', toPosition: 88 });

    expect(await timer.start(bookId, { targetMinutes: 30 })).toEqual({ started: true, stoppedSessionId: null });

    const stored = await row();
    expect(stored).toEqual(
      jasmine.objectContaining({
        state: 'running',
        bookId,
        startedAt: '2026-03-08T20:14:00.000Z',
        pausedMs: 0,
        deviceId: deviceId(),
        targetMinutes: 30,
        startPosition: 88,
      }),
    );
    expect(stored?.deviceName).toMatch(/ on /); // "Chrome on Linux" in this browser
    await until(() => timer.active() !== null);
    expect(timer.book()?.title).toBe('The Cartographer of Tides');
    expect(timer.runningElsewhere()).toBeFalse();

    clock.advance(1000);
    expect(timer.elapsedMs()).toBe(1000);
    clock.advance(24 * MINUTE);
    expect(timer.elapsedMs()).toBe(24 * MINUTE + 1000);
  });

  it('leaves paused time out, and a reload (a new app on the same database) shows the same elapsed time', async () => {
    const bookId = await book();
    await timer.start(bookId);
    clock.advance(10 * MINUTE);
    await timer.pause();
    clock.advance(5 * MINUTE);
    await until(() => timer.active()?.state === 'paused');
    expect(timer.elapsedMs()).toBe(10 * MINUTE); // a paused timer does not count
    await timer.resume();
    clock.advance(15 * MINUTE); // started 20:14, paused 20:24–20:29, now 20:44 → 25 minutes

    TestBed.resetTestingModule(); // the tab closes; nothing was counted in memory
    rememberSession({ user: { ...READER, id: userId } });
    configure();
    await until(() => timer.active() !== null);
    expect(timer.elapsedMs()).toBe(25 * MINUTE);
    expect((await row())?.pausedMs).toBe(5 * MINUTE);
  });

  it('stops into a session and sets the timer idle in one write, starting where the previous session ended', async () => {
    const bookId = await book({ format: 'audiobook', pageCount: null, audioMinutes: 600 });
    await store.create('sessions', { bookId, startedAt: '2026-03-06T08:00:00.000Z', endedAt: '2026-03-06T09:00:00.000Z', toPosition: 60 });
    await store.create('sessions', { bookId, startedAt: '2026-03-07T08:00:00.000Z', endedAt: '2026-03-07T09:00:00.000Z', toPosition: 120 });
    await timer.start(bookId);
    await until(() => timer.active() !== null);
    expect(clock.running).toBe(1);
    clock.advance(25 * MINUTE + 30_000);
    const outboxBefore = await TestBed.inject(LocalJournal).db()!.outbox.count();

    const sessionId = await timer.stop();

    const timerRow = await row();
    expect(sessionId).toBe(sessionIdOf(timerRow!));
    expect(timerRow?.state).toBe('idle');
    const session = (await store.get('sessions', sessionId!)) as Session;
    expect(session).toEqual(
      jasmine.objectContaining({
        bookId,
        format: 'audiobook',
        startedAt: '2026-03-08T20:14:00.000Z',
        endedAt: '2026-03-08T20:39:30.000Z',
        activeMinutes: 25.5,
        fromPosition: 120,
        source: 'timer',
        deleted: false,
      }),
    );
    const written = (await TestBed.inject(LocalJournal).db()!.outbox.toArray()).slice(outboxBefore);
    expect(new Set(written.map((change) => change.collection))).toEqual(new Set(['sessions', 'timers']));
    expect(new Set(written.map((change) => change.hlc)).size).toBe(1); // one transaction, one clock
    await until(() => timer.active() === null);
    expect(clock.running).toBe(0); // nothing ticks once it stopped
    expect(await timer.stop()).toBeNull();
  });

  it('refuses a second timer while one runs, and with replace stops the first into a session before starting', async () => {
    const first = await book();
    const second = await book({ title: 'Small Rain' });
    await timer.start(first);
    clock.advance(12 * MINUTE);

    const refused = await timer.start(second);
    expect(refused.started).toBeFalse();
    expect(refused.started ? null : refused.current.bookId).toBe(first);
    expect(await sessions()).toEqual([]);

    const replaced = await timer.start(second, { replace: true });
    expect(replaced.started).toBeTrue();
    const saved = await sessions();
    expect(saved.length).toBe(1);
    expect(saved[0]).toEqual(jasmine.objectContaining({ bookId: first, activeMinutes: 12 }));
    expect(replaced).toEqual({ started: true, stoppedSessionId: saved[0]!.id });
    expect(await row()).toEqual(jasmine.objectContaining({ state: 'running', bookId: second, startedAt: '2026-03-08T20:26:00.000Z', pausedMs: 0 }));
  });

  it('discards without leaving a session', async () => {
    await timer.start(await book());
    clock.advance(3 * MINUTE);
    await timer.discard();
    expect((await row())?.state).toBe('idle');
    expect(await sessions()).toEqual([]);
  });

  it('knows a timer another device started, and can stop it here', async () => {
    const bookId = await book();
    await store.write('timers', TIMER_ROW_ID, {
      state: 'running',
      bookId,
      startedAt: '2026-03-08T19:54:00.000Z',
      pausedMs: 0,
      deviceId: 'the-laptop',
      deviceName: 'Firefox on Windows',
      deleted: false,
    });
    await until(() => timer.active() !== null);
    expect(timer.runningElsewhere()).toBeTrue();
    expect(timer.elapsedMs()).toBe(20 * MINUTE);

    const sessionId = await timer.stop();
    expect(sessionId).toBe(sessionIdOf({ deviceId: 'the-laptop', startedAt: '2026-03-08T19:54:00.000Z' }));
    expect((await store.get('sessions', sessionId!))?.activeMinutes).toBe(20);
  });

  it('keeps a timer left running for more than 20 hours as a 20-hour session, the longest there can be', async () => {
    await timer.start(await book());
    clock.advance(26 * 60 * MINUTE);
    const session = (await store.get('sessions', (await timer.stop())!)) as Session;
    expect(session.activeMinutes).toBe(1200);
    expect(session.endedAt).toBe('2026-03-09T16:14:00.000Z');
  });

  it('sets and clears the target of the running timer', async () => {
    await timer.start(await book());
    await timer.setTarget(45);
    expect((await row())?.targetMinutes).toBe(45);
    await timer.setTarget(null);
    expect((await row())?.targetMinutes).toBeNull();
  });
});
