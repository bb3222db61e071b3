import type { Role } from '../data-access/entities/user.entity';

/** What `requireAuth` needs to know about a device session and its account. */
export interface SessionState {
  readonly userId: string;
  readonly role: Role;
  readonly disabled: boolean;
  readonly revoked: boolean;
}

/** Past this many sessions the cache starts over rather than growing without bound. */
const MAX_ENTRIES = 50_000;

/** Every cache in this process, so a sign-out or disable here forgets at once (specs run several apps). */
const caches = new Set<SessionChecks>();

/**
 * A short-lived memory of session checks, so a device syncing every few seconds does not cost a
 * database read per request. On the instance that signs a device out, revokes it, disables or
 * deletes the account or changes its role, the entry goes at once ({@link forgetSession},
 * {@link forgetUser}); other instances read the row again within `ttlMs` (a few seconds), so a
 * revoked access token stops working everywhere within that time (it lives 15 minutes otherwise).
 * `ttlMs` 0 turns the cache off.
 */
export class SessionChecks {
  private readonly entries = new Map<string, SessionState & { readonly until: number }>();

  constructor(readonly ttlMs: number) {
    caches.add(this);
  }

  get(sessionId: string, now = Date.now()): SessionState | undefined {
    const entry = this.entries.get(sessionId);
    if (!entry) return undefined;
    if (entry.until > now) return entry;
    this.entries.delete(sessionId);
    return undefined;
  }

  remember(sessionId: string, state: SessionState, now = Date.now()): void {
    if (this.ttlMs <= 0) return;
    if (this.entries.size >= MAX_ENTRIES) this.entries.clear();
    this.entries.set(sessionId, { ...state, until: now + this.ttlMs });
  }

  forgetSession(sessionId: string): void {
    this.entries.delete(sessionId);
  }

  forgetUser(userId: string): void {
    for (const [sessionId, entry] of this.entries) if (entry.userId === userId) this.entries.delete(sessionId);
  }
}

/** A device session was revoked on this instance. */
export function forgetSession(sessionId: string): void {
  for (const cache of caches) cache.forgetSession(sessionId);
}

/** An account's sessions, role or state changed on this instance (sign out everywhere, disable, delete). */
export function forgetUser(userId: string): void {
  for (const cache of caches) cache.forgetUser(userId);
}
