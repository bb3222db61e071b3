import type { AccountUser } from '@shared/api/auth';

import { SESSION_STORAGE_KEY, type StoredSession } from '../stored-session';
import { tokenHandoff } from '../token-handoff';

/** An unsigned token whose payload expires `secondsFromNow` from now (the client never verifies). */
export function tokenExpiringIn(secondsFromNow: number, label = 'a'): string {
  const encode = (value: object) => btoa(JSON.stringify(value)).replace(/=+$/, '').replace(/\+/g, '-').replace(/\//g, '_');
  const exp = Math.floor(Date.now() / 1000) + secondsFromNow;
  return `${encode({ alg: 'HS256' })}.${encode({ sub: 'u1', exp, label })}.c2ln`;
}

export const READER: AccountUser = { id: 'user-1', email: 'ilse@example.com', displayName: 'Ilse Varga', role: 'reader' };
export const ADMIN: AccountUser = { ...READER, id: 'user-2', role: 'admin' };

/** Puts a session in localStorage as an earlier visit would have left it. */
export function rememberSession(overrides: Partial<StoredSession> = {}): StoredSession {
  const session: StoredSession = {
    user: READER,
    accessToken: tokenExpiringIn(600),
    refreshToken: 'refresh-token-one-0123456789',
    needsSignIn: null,
    ...overrides,
  };
  localStorage.setItem(SESSION_STORAGE_KEY, JSON.stringify(session));
  // As Auth stores it; IndexedDB runs this write before any read started after it.
  void tokenHandoff.write(session);
  return session;
}

export function forgetSession(): void {
  localStorage.removeItem(SESSION_STORAGE_KEY);
  void tokenHandoff.write(null);
}
