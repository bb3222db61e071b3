import { inject } from '@angular/core';
import { Router, type CanMatchFn } from '@angular/router';

import { Auth } from './auth';

/** The journal needs a reader on this device; no network is needed to pass. */
export const signedInGuard: CanMatchFn = (_route, segments) => {
  if (inject(Auth).signedIn()) return true;
  const next = '/' + segments.map((segment) => segment.path).join('/');
  return inject(Router).createUrlTree(['/sign-in'], { queryParams: next === '/' ? {} : { next } });
};

/** Admin pages: only for admins (the server checks the role again on every call). */
export const adminGuard: CanMatchFn = () => inject(Auth).isAdmin() || inject(Router).createUrlTree(['/today']);

/** Sign-in and registration: skip them when already signed in, unless a new sign-in is needed. */
export const signedOutGuard: CanMatchFn = () => {
  const auth = inject(Auth);
  return !auth.signedIn() || auth.needsSignIn() !== null || inject(Router).createUrlTree(['/today']);
};
