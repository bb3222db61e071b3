import type { HttpTestingController, TestRequest } from '@angular/common/http/testing';

import type { PullResponse } from '@shared/api/sync';

import { patiently, realPause } from '../../testing/patience';

/** A few real milliseconds for IndexedDB, the Web Lock and the interceptor to move on. */
export const turn = realPause;

/** Resolves once `check` holds; fails the spec with `what` (said when it gives up) if it never does. */
export async function until(check: () => boolean | Promise<boolean>, what: string | (() => string)): Promise<void> {
  await patiently(what, check);
}

/** The request to `url` once it has been sent (Dexie reads, the tab lock and the token take a few turns). */
export function sent(backend: HttpTestingController, url: string): Promise<TestRequest> {
  return patiently(`a request to ${url}`, () => backend.match((request) => request.url === url)[0]);
}

/** Gives a sync that should not happen time to start, then checks that nothing was sent. */
export async function expectNothingSent(backend: HttpTestingController): Promise<void> {
  await turn(150);
  expect(backend.match(() => true).map((request) => `${request.request.method} ${request.request.urlWithParams}`))
    .withContext('requests sent')
    .toEqual([]);
}

/** The server's time in answers: now (a fixed date would read as this device's date being wrong). */
const serverTime = () => new Date().toISOString();

/** A pull answer: these changes, then this cursor. */
export function pullPage(cursor: string, changes: PullResponse['changes'] = [], hasMore = false): PullResponse {
  return { changes, cursor, hasMore, serverTime: serverTime() };
}

/** A pull answer with nothing new. */
export const emptyPage = (cursor: string) => pullPage(cursor);

export const pushed = (applied: number) => ({ applied, duplicates: 0, serverTime: serverTime() });

export const UNAUTHORIZED = { status: 401, statusText: 'Unauthorized' };
export const SERVER_ERROR = { status: 500, statusText: 'Internal Server Error' };
export const NO_NETWORK = { status: 0, statusText: '' };

/** The server's answer when it will never take some changes of a push. */
export function refusedBody(problems: readonly { index: number; code: string; reason: string }[]) {
  return { error: { code: 'invalid_changes', message: 'Some changes were refused', details: problems } };
}

/**
 * Holds this reader's sync lock as another tab would, until `release` is called. Resolves once
 * the lock is granted.
 */
export async function otherTabSyncing(userId: string): Promise<{ release: () => Promise<void> }> {
  let granted!: () => void;
  let finish!: () => void;
  const isGranted = new Promise<void>((resolve) => (granted = resolve));
  const held = navigator.locks.request(`lamplight-sync-${userId}`, () => {
    granted();
    return new Promise<void>((resolve) => (finish = resolve));
  });
  await isGranted;
  return {
    release: async () => {
      finish();
      await held;
    },
  };
}
