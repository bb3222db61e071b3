import { DestroyRef, effect, inject } from '@angular/core';

import { SyncEngine } from '../sync/sync-engine';
import { LATEST_REGISTRATION_MS, WorkerRegistration } from './worker-registration';

/**
 * Lets the service worker register once this session's first sync round is over (its install's
 * downloads would hold the first pull's pages back), or {@link LATEST_REGISTRATION_MS} in at the
 * latest. Call in the signed-in shell's injection context. A file of its own: the sign-in page
 * loads `worker-registration.ts` and must not load the sync engine with it.
 */
export function allowWorkerAfterFirstSync(): void {
  const registration = inject(WorkerRegistration);
  const engine = inject(SyncEngine);
  const timer = setTimeout(() => registration.allow(), LATEST_REGISTRATION_MS);
  inject(DestroyRef).onDestroy(() => clearTimeout(timer));
  effect(() => {
    if (engine.roundsOver() > 0) registration.allow();
  });
}
