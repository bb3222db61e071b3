import type { Routes } from '@angular/router';

/** `/settings`: password, devices, storage, deleting the account. */
export default [{ path: '', title: 'Settings · Lamplight', loadComponent: () => import('./settings').then((m) => m.Settings) }] satisfies Routes;
