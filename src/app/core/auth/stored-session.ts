import type { AccountUser } from '@shared/api/auth';

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

/** This device's own time when each access token arrived (this page's life only). */
const receivedAt = new Map<string, number>();

/** Notes when a token arrived, so its age can be measured by this device's clock alone. */
export function tokenReceived(accessToken: string, now = Date.now()): void {
  receivedAt.set(accessToken, now);
}

/**
 * Seconds left before an access token expires, read from its payload (not verified: the server
 * does that). When the token arrived in this page, its age is measured from then: a device whose
 * date is days off would otherwise find every token expired, or never expired.
 */
export function secondsUntilExpiry(accessToken: string, now = Date.now()): number {
  try {
    const payload = accessToken.split('.')[1] ?? '';
    const json = atob(payload.replace(/-/g, '+').replace(/_/g, '/'));
    const { exp, iat } = JSON.parse(json) as { exp?: unknown; iat?: unknown };
    if (typeof exp !== 'number') return 0;
    const arrived = receivedAt.get(accessToken);
    if (arrived !== undefined && typeof iat === 'number') return exp - iat - (now - arrived) / 1000;
    return exp - now / 1000;
  } catch {
    return 0;
  }
}
