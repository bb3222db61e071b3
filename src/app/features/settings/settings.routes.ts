import type { Routes } from '@angular/router';

/** `/settings`: password, devices, storage, deleting the account; `/settings/trash`: what was deleted. */
export default [
  { path: '', title: 'Settings · Lamplight', loadComponent: () => import('./settings').then((m) => m.Settings) },
  { path: 'trash', title: 'Trash · Lamplight', loadComponent: () => import('./trash-page/trash-page').then((m) => m.TrashPage) },
] satisfies Routes;
