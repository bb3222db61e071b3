import type { Routes } from '@angular/router';

import { signedOutGuard } from '../../core/auth/auth-guards';

/** Signing in, creating a journal and choosing a new password (mounted at the root). */
const accountRoutes = [
  {
    path: 'sign-in',
    title: 'Sign in · Lamplight',
    canMatch: [signedOutGuard],
    loadComponent: () => import('./sign-in/sign-in').then((m) => m.SignIn),
  },
  {
    path: 'register',
    title: 'Create your journal · Lamplight',
    canMatch: [signedOutGuard],
    loadComponent: () => import('./register/register').then((m) => m.Register),
  },
  {
    path: 'forgot-password',
    title: 'Choose a new password · Lamplight',
    loadComponent: () => import('./forgot-password/forgot-password').then((m) => m.ForgotPassword),
  },
  {
    path: 'reset-password',
    title: 'Choose a new password · Lamplight',
    loadComponent: () => import('./reset-password/reset-password').then((m) => m.ResetPassword),
  },
  {
    path: 'verify-email',
    title: 'Confirm your e-mail address · Lamplight',
    loadComponent: () => import('./verify-email/verify-email').then((m) => m.VerifyEmail),
  },
] satisfies Routes;
export default accountRoutes;

/**
 * Starts loading the page a signed-out reader opening `path` will see (sign-in, unless it is another
 * account page) while Angular starts, rather than once the router has matched it: the first
 * screen's chain of requests gets one step shorter. The router's own load reuses the module.
 */
export function preloadSignedOutPage(path: string): void {
  const page = accountRoutes.find((route) => path === `/${route.path}`) ?? accountRoutes[0];
  page.loadComponent().catch(() => undefined); // a failed fetch fails again where the router loads it, and is reported there
}
