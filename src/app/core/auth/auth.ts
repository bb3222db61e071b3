import { HttpClient, HttpErrorResponse } from '@angular/common/http';
import { computed, inject, Injectable, signal } from '@angular/core';
import { firstValueFrom } from 'rxjs';

import type { AccountUser, SignedIn, TokenPair } from '@shared/api/auth';

import { browserStorage } from '../device/browser-storage';
import { tokenHandoff } from './token-handoff';
import { secondsUntilExpiry, SESSION_STORAGE_KEY, tokenReceived, type StoredSession } from './stored-session';
import { deviceId } from '../device/device-id';

/** Refresh a little before expiry, so a request does not leave with a token about to lapse. */
const REFRESH_MARGIN_SECONDS = 30;

/**
 * The signed-in reader on this device. Sign-in needs the network once; after that the session is
 * remembered locally, so the app opens offline straight into the reader's journal and tokens are
 * refreshed silently when there is a connection again.
 */
@Injectable({ providedIn: 'root' })
export class Auth {
  private readonly http = inject(HttpClient);
  private readonly session = signal<StoredSession | null>(browserStorage.read<StoredSession>(SESSION_STORAGE_KEY));
  private refreshing: Promise<string | null> | null = null;

  /** The reader, or `null` when nobody is signed in on this device. */
  readonly user = computed(() => this.session()?.user ?? null);
  readonly signedIn = computed(() => this.session() !== null);
  readonly isAdmin = computed(() => this.session()?.user.role === 'admin');
  /** Why the server wants a new sign-in before syncing, or `null`. */
  readonly needsSignIn = computed(() => this.session()?.needsSignIn ?? null);

  constructor() {
    // Another tab signed in, out, or refreshed the tokens: follow it.
    globalThis.addEventListener?.('storage', (event: StorageEvent) => {
      if (event.key === SESSION_STORAGE_KEY) this.session.set(browserStorage.read<StoredSession>(SESSION_STORAGE_KEY));
    });
  }

  async signIn(email: string, password: string): Promise<AccountUser> {
    const answer = await firstValueFrom(this.http.post<SignedIn>('/api/auth/login', { email, password, deviceId: deviceId() }));
    void this.store({ user: answer.user, accessToken: answer.accessToken, refreshToken: answer.refreshToken, needsSignIn: null });
    return answer.user;
  }

  async register(email: string, password: string, displayName: string): Promise<AccountUser> {
    const answer = await firstValueFrom(this.http.post<SignedIn>('/api/auth/register', { email, password, displayName, deviceId: deviceId() }));
    void this.store({ user: answer.user, accessToken: answer.accessToken, refreshToken: answer.refreshToken, needsSignIn: null });
    return answer.user;
  }

  /**
   * Ends the session on this device. The server is told when it can be reached; offline, the
   * local sign-out still happens (the device can also be signed out from another one).
   */
  async signOut(): Promise<void> {
    if (this.session() && !this.needsSignIn()) {
      await firstValueFrom(this.http.post('/api/auth/logout', {})).catch(() => undefined);
    }
    void this.store(null);
  }

  /** The current access token, refreshed first when it is about to expire. */
  async freshAccessToken(): Promise<string | null> {
    const current = this.session();
    if (!current || current.needsSignIn) return null;
    if (secondsUntilExpiry(current.accessToken) > REFRESH_MARGIN_SECONDS) return current.accessToken;
    return (await this.refresh().catch(() => null)) ?? current.accessToken;
  }

  /**
   * Exchanges the refresh token for a new pair; one exchange at a time in this tab and, through
   * the Web Locks API, across tabs (a token used twice would end the session). Resolves `null`
   * when the server refuses (the reader must sign in again); rejects when it cannot be reached.
   * `refused` is the access token a 401 came back for: if it is no longer the current one, the
   * current one is answered instead of a second exchange.
   */
  refresh(refused?: string): Promise<string | null> {
    this.refreshing ??= this.withRefreshLock(() => this.exchange(refused)).finally(() => (this.refreshing = null));
    return this.refreshing;
  }

  /** Keeps the display name in step after the account changes. */
  updateUser(user: AccountUser): void {
    const current = this.session();
    if (current) void this.store({ ...current, user });
  }

  private async exchange(refused?: string): Promise<string | null> {
    // Another tab may have refreshed while we waited for the lock: use its tokens (IndexedDB has
    // them already; this tab's copy of localStorage may not yet).
    const local = browserStorage.read<StoredSession>(SESSION_STORAGE_KEY) ?? this.session();
    if (!local) return null;
    const stored = await tokenHandoff.newest(local);
    if (stored.needsSignIn) {
      this.session.set(stored);
      return null;
    }
    // A 401 for a request sent before a refresh (here or in another tab) needs no second one.
    if (refused !== undefined && stored.accessToken !== refused) {
      this.session.set(stored);
      return stored.accessToken;
    }
    // A stored token still fresh (another tab's refresh, already mirrored here by the storage event) is used as it is.
    if (stored.accessToken !== refused && secondsUntilExpiry(stored.accessToken) > REFRESH_MARGIN_SECONDS) {
      this.session.set(stored);
      return stored.accessToken;
    }
    try {
      const pair = await firstValueFrom(this.http.post<TokenPair>('/api/auth/refresh', { refreshToken: stored.refreshToken }));
      await this.store({ ...stored, ...pair, needsSignIn: null }, stored.refreshToken);
      return pair.accessToken;
    } catch (error) {
      if (error instanceof HttpErrorResponse && (error.status === 401 || error.status === 403 || error.status === 400)) {
        const reason = (error.error as { error?: { message?: string } } | null)?.error?.message ?? 'Sign in again to sync';
        await this.store({ ...stored, needsSignIn: reason });
        return null;
      }
      throw error; // offline or server trouble: keep everything as it is and try later
    }
  }

  private withRefreshLock<T>(work: () => Promise<T>): Promise<T> {
    const locks = globalThis.navigator?.locks;
    return locks ? (locks.request('lamplight-token-refresh', work) as Promise<T>) : work();
  }

  /** Resolves once the other tabs can read the session from IndexedDB. */
  private store(session: StoredSession | null, spentRefreshToken: string | null = null): Promise<void> {
    if (session && session.accessToken !== this.session()?.accessToken) tokenReceived(session.accessToken);
    this.session.set(session);
    if (session) browserStorage.write(SESSION_STORAGE_KEY, session);
    else browserStorage.remove(SESSION_STORAGE_KEY);
    return tokenHandoff.write(session, spentRefreshToken);
  }
}
