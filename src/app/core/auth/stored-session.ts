import type { AccountUser } from '@shared/account/account-input';

/** What this device remembers about the signed-in reader between visits, online or not. */
export interface StoredSession {
  readonly user: AccountUser;
  readonly accessToken: string;
  readonly refreshToken: string;
  /**
   * Set when the server refused the refresh token (signed out elsewhere, password changed,
   * account disabled). The reader keeps working locally; sync waits for a new sign-in.
   */
  readonly needsSignIn: string | null;
}

export const SESSION_STORAGE_KEY = 'lamplight.session';

/** Seconds left before an access token expires, read from its payload (not verified: the server does that). */
export function secondsUntilExpiry(accessToken: string, now = Date.now()): number {
  try {
    const payload = accessToken.split('.')[1] ?? '';
    const json = atob(payload.replace(/-/g, '+').replace(/_/g, '/'));
    const exp = (JSON.parse(json) as { exp?: unknown }).exp;
    return typeof exp === 'number' ? exp - now / 1000 : 0;
  } catch {
    return 0;
  }
}
