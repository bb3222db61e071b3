import { TestBed } from '@angular/core/testing';
import { provideHttpClient } from '@angular/common/http';
import { provideRouter, Router, UrlSegment, UrlTree, type Route } from '@angular/router';

import { adminGuard, signedInGuard, signedOutGuard } from './auth-guards';
import { ADMIN, forgetSession, rememberSession } from './testing/session-fixtures';

describe('auth guards', () => {
  const route: Route = {};
  const segments = [new UrlSegment('library', {})];

  function run(guard: typeof signedInGuard): boolean | UrlTree {
    TestBed.configureTestingModule({ providers: [provideRouter([]), provideHttpClient()] });
    return TestBed.runInInjectionContext(() => guard(route, segments)) as boolean | UrlTree;
  }
  const url = (result: boolean | UrlTree) => (result instanceof UrlTree ? TestBed.inject(Router).serializeUrl(result) : result);

  afterEach(() => forgetSession());

  it('signedInGuard sends a device without a reader to sign-in, remembering where they were going', () => {
    forgetSession();
    expect(url(run(signedInGuard))).toBe('/sign-in?next=%2Flibrary');
  });

  it('signedInGuard lets a remembered reader in with no network at all', () => {
    rememberSession();
    expect(run(signedInGuard)).toBeTrue();
  });

  it('signedInGuard still lets the reader in when the server wants a new sign-in (local data stays usable)', () => {
    rememberSession({ needsSignIn: 'This device was signed out' });
    expect(run(signedInGuard)).toBeTrue();
  });

  it('adminGuard turns readers back to Today and lets admins through', () => {
    rememberSession();
    expect(url(run(adminGuard))).toBe('/today');
    TestBed.resetTestingModule();
    rememberSession({ user: ADMIN });
    expect(run(adminGuard)).toBeTrue();
  });

  it('signedOutGuard skips sign-in for a signed-in reader, unless a new sign-in is needed', () => {
    rememberSession();
    expect(url(run(signedOutGuard))).toBe('/today');
    TestBed.resetTestingModule();
    rememberSession({ needsSignIn: 'Sign in again' });
    expect(run(signedOutGuard)).toBeTrue();
  });
});
