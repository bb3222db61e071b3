import type { Routes } from '@angular/router';

/** `/settings`: password, devices, storage, deleting the account; `/settings/trash`: what was deleted; `/settings/your-data`: export and import. */
export default [
  { path: '', title: 'Settings · Lamplight', loadComponent: () => import('./settings').then((m) => m.Settings) },
  { path: 'trash', title: 'Trash · Lamplight', loadComponent: () => import('./trash-page/trash-page').then((m) => m.TrashPage) },
  { path: 'your-data', loadChildren: () => import('../your-data/your-data.routes') },
] satisfies Routes;
