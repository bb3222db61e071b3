import { HttpClient, provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { firstValueFrom } from 'rxjs';

import { sentRequest } from '../http/testing/sent-request';

import { Auth } from './auth';
import { authInterceptor } from './auth-interceptor';
import { forgetSession, rememberSession, tokenExpiringIn } from './testing/session-fixtures';

describe('authInterceptor', () => {
  let http: HttpClient;
  let backend: HttpTestingController;

  /** The request to `url` once it has been sent (the token lookup and the Web Lock take a few turns). */
  const sent = (url: string) => sentRequest(backend, url);

  const unauthorized = { status: 401, statusText: 'Unauthorized' };
  const offline = { status: 0, statusText: '' };

  function setUp(): void {
    TestBed.configureTestingModule({
      providers: [provideHttpClient(withInterceptors([authInterceptor])), provideHttpClientTesting()],
    });
    http = TestBed.inject(HttpClient);
    backend = TestBed.inject(HttpTestingController);
  }

  afterEach(() => {
    backend.verify();
    forgetSession();
  });

  it('adds the bearer token to API calls but not to sign-in', async () => {
    const session = rememberSession();
    setUp();

    void firstValueFrom(http.get('/api/devices'));
    void firstValueFrom(http.post('/api/auth/login', {}));

    expect((await sent('/api/devices')).request.headers.get('Authorization')).toBe(`Bearer ${session.accessToken}`);
    expect((await sent('/api/auth/login')).request.headers.has('Authorization')).toBeFalse();
  });

  it('on a 401, refreshes once and retries once with the new token', async () => {
    rememberSession();
    setUp();
    const fresh = tokenExpiringIn(900, 'fresh');

    const answer = firstValueFrom(http.get<{ ok: boolean }>('/api/devices'));
    (await sent('/api/devices')).flush({ error: { code: 'token_expired' } }, unauthorized);
    const refresh = await sent('/api/auth/refresh');
    expect(refresh.request.body).toEqual({ refreshToken: 'refresh-token-one-0123456789' });
    refresh.flush({ accessToken: fresh, refreshToken: 'refresh-token-two-0123456789' });
    const retry = await sent('/api/devices');
    expect(retry.request.headers.get('Authorization')).toBe(`Bearer ${fresh}`);
    retry.flush({ ok: true });

    expect(await answer).toEqual({ ok: true });
  });

  it('when the retry fails again, does not loop: one refresh, one retry, then the error', async () => {
    rememberSession();
    setUp();

    const answer = firstValueFrom(http.get('/api/devices'));
    (await sent('/api/devices')).flush(null, unauthorized);
    (await sent('/api/auth/refresh')).flush({ accessToken: tokenExpiringIn(900), refreshToken: 'refresh-token-two-0123456789' });
    (await sent('/api/devices')).flush(null, unauthorized);

    await expectAsync(answer).toBeRejected();
    backend.expectNone('/api/auth/refresh');
  });

  it('shares one refresh between requests that fail together', async () => {
    rememberSession();
    setUp();

    const first = firstValueFrom(http.get('/api/devices'));
    const second = firstValueFrom(http.get('/api/auth/me'));
    (await sent('/api/devices')).flush(null, unauthorized);
    (await sent('/api/auth/me')).flush(null, unauthorized);
    (await sent('/api/auth/refresh')).flush({ accessToken: tokenExpiringIn(900), refreshToken: 'refresh-token-two-0123456789' });
    (await sent('/api/devices')).flush({ one: 1 });
    (await sent('/api/auth/me')).flush({ two: 2 });

    expect(await first).toEqual({ one: 1 });
    expect(await second).toEqual({ two: 2 });
  });

  it('when the refresh is refused, asks for a new sign-in but keeps the reader on this device', async () => {
    rememberSession();
    setUp();
    const auth = TestBed.inject(Auth);

    const answer = firstValueFrom(http.get('/api/devices'));
    (await sent('/api/devices')).flush(null, unauthorized);
    (await sent('/api/auth/refresh')).flush(
      { error: { code: 'refresh_revoked', message: 'This device was signed out; sign in again', details: null } },
      unauthorized,
    );

    await expectAsync(answer).toBeRejected();
    expect(auth.signedIn()).toBeTrue();
    expect(auth.needsSignIn()).toBe('This device was signed out; sign in again');
  });

  it('when offline, passes the failure on without refreshing or signing out', async () => {
    rememberSession();
    setUp();
    const auth = TestBed.inject(Auth);

    const answer = firstValueFrom(http.get('/api/devices'));
    (await sent('/api/devices')).error(new ProgressEvent('error'), offline);

    await expectAsync(answer).toBeRejected();
    backend.expectNone('/api/auth/refresh');
    expect(auth.signedIn()).toBeTrue();
    expect(auth.needsSignIn()).toBeNull();
  });

  it('when the access token has already expired, refreshes before sending', async () => {
    rememberSession({ accessToken: tokenExpiringIn(-60) });
    setUp();
    const fresh = tokenExpiringIn(900, 'fresh');

    void firstValueFrom(http.get('/api/devices'));
    (await sent('/api/auth/refresh')).flush({ accessToken: fresh, refreshToken: 'refresh-token-two-0123456789' });

    expect((await sent('/api/devices')).request.headers.get('Authorization')).toBe(`Bearer ${fresh}`);
  });

  it('when offline with an expired token, the request still goes and fails calmly; nobody is signed out', async () => {
    const session = rememberSession({ accessToken: tokenExpiringIn(-60) });
    setUp();
    const auth = TestBed.inject(Auth);

    const answer = firstValueFrom(http.get('/api/devices'));
    (await sent('/api/auth/refresh')).error(new ProgressEvent('error'), offline);
    const request = await sent('/api/devices');
    expect(request.request.headers.get('Authorization')).toBe(`Bearer ${session.accessToken}`);
    request.error(new ProgressEvent('error'), offline);

    await expectAsync(answer).toBeRejected();
    expect(auth.signedIn()).toBeTrue();
    expect(auth.needsSignIn()).toBeNull();
  });
});
