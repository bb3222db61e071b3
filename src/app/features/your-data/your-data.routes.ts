import type { Routes } from '@angular/router';

/** `/settings/your-data`: export, import and duplicates. */
export default [
  { path: '', title: 'Your data · Lamplight', loadComponent: () => import('./your-data-page/your-data-page').then((m) => m.YourDataPage) },
] satisfies Routes;
