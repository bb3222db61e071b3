import { createStore, del, get, set, type UseStore } from 'idb-keyval';

import type { StoredSession } from './stored-session';

/**
 * The newest session, handed from tab to tab through IndexedDB while the refresh lock is held.
 *
 * localStorage alone cannot do this: Chromium copies a write to the other tabs' processes a moment
 * later, so a tab that takes the lock just after another released it may still read the spent
 * refresh token and present it a second time. IndexedDB answers every tab from one store, in order.
 * When IndexedDB is unavailable (some private modes) localStorage serves, with its small delay.
 */
interface Handed {
  readonly session: StoredSession;
  /** The refresh token exchanged for this session's, so a tab holding it knows it is one step behind. */
  readonly spentRefreshToken: string | null;
}

let store: UseStore | null = null;
const handoffStore = () => (store ??= createStore('lamplight-auth', 'session'));
const KEY = 'current';

export const tokenHandoff = {
  /**
   * The handed session when it succeeds `local` (another tab exchanged `local`'s refresh token);
   * `local` otherwise, marked as needing a sign-in when another tab had its token refused.
   */
  async newest(local: StoredSession): Promise<StoredSession> {
    let handed: Handed | undefined;
    try {
      handed = await get<Handed>(KEY, handoffStore());
    } catch {
      return local;
    }
    if (!handed) return local;
    if (handed.spentRefreshToken === local.refreshToken) return handed.session;
    const refusedElsewhere = handed.session.refreshToken === local.refreshToken && !local.needsSignIn && handed.session.needsSignIn;
    return refusedElsewhere ? { ...local, needsSignIn: handed.session.needsSignIn } : local;
  },
  /** Resolves once the session is written (or could not be): the lock is held until then. */
  async write(session: StoredSession | null, spentRefreshToken: string | null = null): Promise<void> {
    try {
      await (session ? set(KEY, { session, spentRefreshToken } satisfies Handed, handoffStore()) : del(KEY, handoffStore()));
    } catch {
      // No IndexedDB here: localStorage still carries the session.
    }
  },
};
