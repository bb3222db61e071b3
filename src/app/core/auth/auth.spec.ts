import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';

import { sentRequest } from '../http/testing/sent-request';
import { Auth } from './auth';
import { SESSION_STORAGE_KEY, type StoredSession } from './stored-session';
import { forgetSession, rememberSession, tokenExpiringIn } from './testing/session-fixtures';

/**
 * Refresh-token rotation as the browser lives it (RFC 9700 §4.14.2: every refresh token is
 * good once; presenting one twice, after the server's short grace window, ends the session on
 * every device). The server's side is in spec/server/refresh-rotation.spec.ts.
 */
describe('Auth token rotation', () => {
  let backend: HttpTestingController;

  const turn = () => new Promise((resolve) => setTimeout(resolve, 5));
  const stored = () => JSON.parse(localStorage.getItem(SESSION_STORAGE_KEY) ?? 'null') as StoredSession | null;

  /** The next refresh request once sent (the Web Lock and storage take a few turns). */
  const nextRefresh = () => sentRequest(backend, '/api/auth/refresh');

  beforeEach(() => {
    TestBed.configureTestingModule({ providers: [provideHttpClient(), provideHttpClientTesting()] });
    backend = TestBed.inject(HttpTestingController);
  });

  afterEach(() => {
    backend.verify();
    forgetSession();
  });

  it('stores the new refresh token, so the next refresh presents it and not the spent one', async () => {
    rememberSession({ accessToken: tokenExpiringIn(5, 'old'), refreshToken: 'refresh-token-one-0123456789' });
    const auth = TestBed.inject(Auth);
    const second = { accessToken: tokenExpiringIn(10, 'second'), refreshToken: 'refresh-token-two-0123456789' };
    const third = { accessToken: tokenExpiringIn(900, 'third'), refreshToken: 'refresh-token-three-012345678' };

    const first = auth.freshAccessToken();
    const one = await nextRefresh();
    expect(one.request.body).toEqual({ refreshToken: 'refresh-token-one-0123456789' });
    one.flush(second);
    expect(await first).toBe(second.accessToken);
    expect(stored()?.refreshToken).toBe(second.refreshToken);

    // The new access token is already near its end: a second refresh follows at once.
    const again = auth.freshAccessToken();
    const two = await nextRefresh();
    expect(two.request.body).toEqual({ refreshToken: second.refreshToken });
    two.flush(third);

    expect(await again).toBe(third.accessToken);
    expect(stored()).toEqual(jasmine.objectContaining({ ...third, needsSignIn: null }));
  });

  it('when the answer to a refresh is lost, keeps the old token and presents it again (the server’s grace window answers it)', async () => {
    rememberSession({ accessToken: tokenExpiringIn(5, 'old'), refreshToken: 'refresh-token-one-0123456789' });
    const auth = TestBed.inject(Auth);
    const pair = { accessToken: tokenExpiringIn(900, 'new'), refreshToken: 'refresh-token-two-0123456789' };

    const lost = auth.refresh();
    (await nextRefresh()).flush(null, { status: 0, statusText: '' });
    await expectAsync(lost).toBeRejected();
    expect(stored()?.refreshToken).toBe('refresh-token-one-0123456789');
    expect(stored()?.needsSignIn).toBeNull();

    const retry = auth.refresh();
    const request = await nextRefresh();
    expect(request.request.body).toEqual({ refreshToken: 'refresh-token-one-0123456789' });
    request.flush(pair);
    expect(await retry).toBe(pair.accessToken);
    expect(stored()?.refreshToken).toBe(pair.refreshToken);
  });

  it('when two tabs both need a refresh at once, only one presents the refresh token; the other takes the new pair', async () => {
    rememberSession({ accessToken: tokenExpiringIn(5, 'old'), refreshToken: 'refresh-token-one-0123456789' });
    // Two Auth instances over one localStorage and one origin's Web Locks, as two tabs have.
    const tabA = TestBed.runInInjectionContext(() => new Auth());
    const tabB = TestBed.runInInjectionContext(() => new Auth());
    const pair = { accessToken: tokenExpiringIn(900, 'new'), refreshToken: 'refresh-token-two-0123456789' };

    const a = tabA.freshAccessToken();
    const b = tabB.freshAccessToken();
    (await nextRefresh()).flush(pair);

    expect(await a).toBe(pair.accessToken);
    expect(await b).toBe(pair.accessToken);
    await turn();
    expect(backend.match('/api/auth/refresh').length).withContext('refresh requests after the first').toBe(0);
    expect(stored()?.refreshToken).toBe(pair.refreshToken);
  });

  it('when a tab takes the lock before localStorage shows it the new pair, it takes the pair from IndexedDB and presents nothing', async () => {
    const before = rememberSession({ accessToken: tokenExpiringIn(5, 'old'), refreshToken: 'refresh-token-one-0123456789' });
    const tabA = TestBed.runInInjectionContext(() => new Auth());
    const pair = { accessToken: tokenExpiringIn(900, 'new'), refreshToken: 'refresh-token-two-0123456789' };
    const a = tabA.refresh();
    (await nextRefresh()).flush(pair);
    expect(await a).toBe(pair.accessToken);

    // Chromium copies localStorage to other tabs' processes later: tab B still sees the spent token.
    localStorage.setItem(SESSION_STORAGE_KEY, JSON.stringify(before));
    const tabB = TestBed.runInInjectionContext(() => new Auth());
    expect(await tabB.freshAccessToken()).toBe(pair.accessToken);
    await turn();
    expect(backend.match('/api/auth/refresh').length).withContext('refresh requests from the second tab').toBe(0);
  });

  it('when the server refuses the refresh token, asks for a new sign-in and keeps the journal on the device', async () => {
    rememberSession({ accessToken: tokenExpiringIn(5, 'old') });
    const auth = TestBed.inject(Auth);

    const refused = auth.refresh();
    (await nextRefresh()).flush({ error: { code: 'refresh_reused', message: 'This sign-in was used twice' } }, { status: 401, statusText: 'Unauthorized' });

    expect(await refused).toBeNull();
    expect(auth.signedIn()).toBeTrue();
    expect(auth.needsSignIn()).toBe('This sign-in was used twice');
  });

  it('when another tab had the refresh token refused, a tab with a stale copy asks for a sign-in too and presents nothing', async () => {
    const before = rememberSession({ accessToken: tokenExpiringIn(5, 'old') });
    const tabA = TestBed.runInInjectionContext(() => new Auth());
    const refused = tabA.refresh();
    (await nextRefresh()).flush({ error: { code: 'session_revoked', message: 'Signed out on another device' } }, { status: 401, statusText: 'Unauthorized' });
    expect(await refused).toBeNull();

    localStorage.setItem(SESSION_STORAGE_KEY, JSON.stringify(before)); // tab B's copy, not yet updated
    const tabB = TestBed.runInInjectionContext(() => new Auth());
    expect(await tabB.refresh()).toBeNull();
    expect(tabB.needsSignIn()).toBe('Signed out on another device');
    await turn();
    expect(backend.match('/api/auth/refresh').length).withContext('refresh requests from the second tab').toBe(0);
  });
});
