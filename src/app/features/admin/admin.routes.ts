import type { Routes } from '@angular/router';

/** `/admin` (admins only, guarded where it is mounted): accounts and, in development, caught mail. */
export default [
  { path: '', title: 'Accounts · Lamplight', loadComponent: () => import('./accounts/accounts').then((m) => m.Accounts) },
  { path: 'mail', title: 'Caught mail · Lamplight', loadComponent: () => import('./mail/mail').then((m) => m.Mail) },
] satisfies Routes;
