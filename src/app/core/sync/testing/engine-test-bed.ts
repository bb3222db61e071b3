import { provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { signal } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import Dexie from 'dexie';

import { authInterceptor } from '../../auth/auth-interceptor';
import { forgetSession, READER, rememberSession } from '../../auth/testing/session-fixtures';
import { journalDbName, type JournalDb } from '../../data/journal-db';
import { LocalJournal } from '../../data/local-journal';
import { FIRST_SCREEN_SETTLED } from '../../tasks/first-screen';

/** What a spec of the sync engine works with. */
export interface EngineTestBed {
  readonly userId: string;
  readonly backend: HttpTestingController;
  readonly clock: jasmine.Clock;
  readonly db: JournalDb;
}

/**
 * A signed-in reader (id `prefix-…`) with a fresh journal, already open, the auth interceptor and
 * HttpTestingController as the server, and jasmine.clock installed at today's date (timers and
 * Date; IndexedDB and locks keep real time). Call in `beforeEach`; undo with {@link closeEngineTestBed}.
 */
export async function openEngineTestBed(prefix: string): Promise<EngineTestBed> {
  const userId = `${prefix}-${crypto.randomUUID()}`;
  rememberSession({ user: { ...READER, id: userId } });
  const clock = jasmine.clock();
  clock.install();
  clock.mockDate(new Date());
  TestBed.configureTestingModule({
    // The first screen is up: sync starts at once.
    providers: [provideHttpClient(withInterceptors([authInterceptor])), provideHttpClientTesting(), { provide: FIRST_SCREEN_SETTLED, useValue: signal(true) }],
  });
  const db = TestBed.inject(LocalJournal).db()!;
  await db.open();
  return { userId, backend: TestBed.inject(HttpTestingController), clock, db };
}

/** Stops the engine's timers, closes and deletes the journal, and checks no request was left unanswered. */
export async function closeEngineTestBed({ userId, backend, clock }: EngineTestBed): Promise<void> {
  TestBed.resetTestingModule(); // stops the engine's timers and closes the database
  clock.uninstall();
  backend.verify();
  await Dexie.delete(journalDbName(userId));
  forgetSession();
}
