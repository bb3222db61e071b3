import type { HttpTestingController } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';

import { SyncEngine } from '../sync/sync-engine';
import { closeEngineTestBed, openEngineTestBed, type EngineTestBed } from '../sync/testing/engine-test-bed';
import { emptyPage, NO_NETWORK, sent, turn, until } from '../sync/testing/sync-backend';
import { allowWorkerAfterFirstSync } from './allow-worker-after-first-sync';
import { LATEST_REGISTRATION_MS, WorkerRegistration } from './worker-registration';

/**
 * The real sync engine on this device's IndexedDB, with HttpTestingController as the server;
 * jasmine.clock for timers, real time for IndexedDB and locks.
 */
describe('allowWorkerAfterFirstSync', () => {
  let bed: EngineTestBed;
  let backend: HttpTestingController;
  let clock: jasmine.Clock;
  let allowed: boolean;

  beforeEach(async () => {
    bed = await openEngineTestBed('worker');
    ({ backend, clock } = bed);
    allowed = false;
    TestBed.inject(WorkerRegistration).allowed$.subscribe(() => (allowed = true));
    TestBed.runInInjectionContext(allowWorkerAfterFirstSync);
    TestBed.inject(SyncEngine);
    TestBed.tick();
    clock.tick(0);
  });

  afterEach(() => closeEngineTestBed(bed));

  it('allows the worker once the first sync round is over, not while it runs', async () => {
    const pull = await sent(backend, '/api/sync/pull');
    await turn(20);
    TestBed.tick();
    expect(allowed).withContext('while the first pull is unanswered').toBeFalse();

    pull.flush(emptyPage('cursor-1'));
    await until(() => (TestBed.tick(), allowed), 'the worker is allowed');
    expect(TestBed.inject(SyncEngine).roundsOver()).toBe(1);
  });

  it('allows it after a round that failed too (offline: the worker then waits on the browser)', async () => {
    (await sent(backend, '/api/sync/pull')).error(new ProgressEvent('error'), NO_NETWORK);
    await until(() => (TestBed.tick(), allowed), 'the worker is allowed');
    expect(TestBed.inject(SyncEngine).phase()).toBe('offline');
  });

  it('allows it at the latest after LATEST_REGISTRATION_MS when the first round has not ended', async () => {
    const pull = await sent(backend, '/api/sync/pull');
    clock.tick(LATEST_REGISTRATION_MS - 1);
    expect(allowed).toBeFalse();
    clock.tick(1);
    expect(allowed).toBeTrue();
    pull.flush(emptyPage('cursor-1')); // answered, so nothing is left open
    await until(() => TestBed.inject(SyncEngine).phase() === 'idle', 'the round ends');
  });
});
