import { provideHttpClient } from '@angular/common/http';
import { ApplicationRef, type EnvironmentProviders, type Provider } from '@angular/core';
import { TestBed, type ComponentFixture } from '@angular/core/testing';
import { provideRouter, type Routes } from '@angular/router';
import Dexie from 'dexie';

import { forgetSession, READER, rememberSession } from '../auth/testing/session-fixtures';
import type { JournalDb } from '../data/journal-db';
import { journalDbName } from '../data/journal-db';
import { JournalStore } from '../data/journal-store';
import { LocalJournal } from '../data/local-journal';
import { PATIENCE_MS, patiently } from './patience';

/** A signed-in reader with a fresh, real IndexedDB journal (Dexie in Chromium), for one spec. */
export interface TestJournal {
  readonly store: JournalStore;
  readonly db: JournalDb;
  /** Closes and deletes the database and forgets the session. */
  close(): Promise<void>;
}

/** Configures TestBed for a fresh reader; call in `beforeEach`, and `close()` in `afterEach`. */
export function openTestJournal(providers: (Provider | EnvironmentProviders)[] = [], routes: Routes = []): TestJournal {
  const userId = `spec-${crypto.randomUUID()}`;
  rememberSession({ user: { ...READER, id: userId } });
  TestBed.configureTestingModule({ providers: [provideHttpClient(), provideRouter(routes), ...providers] });
  const store = TestBed.inject(JournalStore);
  const db = TestBed.inject(LocalJournal).db()!;
  return {
    store,
    db,
    async close() {
      TestBed.resetTestingModule(); // closes the database (LocalJournal's cleanup)
      await Dexie.delete(journalDbName(userId));
      forgetSession();
    },
  };
}

/**
 * Waits until `check` passes, letting live queries and change detection run in between.
 * Live queries answer asynchronously, so a fixed wait would be either flaky or slow.
 */
export async function until(check: () => boolean, fixture?: ComponentFixture<unknown>, timeoutMs = PATIENCE_MS): Promise<void> {
  await patiently('the condition', check, () => fixture?.whenStable(), timeoutMs);
}

/**
 * Waits until `check` passes (it may be async), letting change detection and live queries run in
 * between; fails naming `what` when it has waited too long.
 */
export async function waitFor(fixture: ComponentFixture<unknown>, check: () => unknown, what: string): Promise<void> {
  await patiently(what, check, () => fixture.whenStable());
}

/**
 * Waits until `check` gives something (a dialog's element, say), letting the whole app settle in
 * between: for what lives outside any fixture, such as a dialog. Fails naming `what`.
 */
export function found<T>(check: () => T | null | undefined | false, what: string): Promise<T> {
  return patiently(what, check, () => TestBed.inject(ApplicationRef).whenStable()) as Promise<T>;
}

/** The element's text with runs of whitespace as single spaces. */
export function textOf(element: Element | null | undefined): string {
  return (element?.textContent ?? '').replace(/\s+/g, ' ').trim();
}

/**
 * Where the outbox ends now. The outbox keeps only the newest change per field (older ones are
 * dropped when a field is written again), so specs find what a step wrote by sequence, not by count.
 */
export async function outboxMark(db: JournalDb): Promise<number> {
  return (await db.outbox.orderBy('seq').last())?.seq ?? 0;
}

/** The outbox changes written after `mark` (see {@link outboxMark}), oldest first. */
export function outboxSince(db: JournalDb, mark: number) {
  return db.outbox.where('seq').above(mark).toArray();
}
