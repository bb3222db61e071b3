import type { Routes } from '@angular/router';

/** `/settings`: password, devices, storage, deleting the account; `/settings/your-data`: export and import. */
export default [
  { path: '', title: 'Settings · Lamplight', loadComponent: () => import('./settings').then((m) => m.Settings) },
  { path: 'your-data', loadChildren: () => import('../your-data/your-data.routes') },
] satisfies Routes;
