import type { Routes } from '@angular/router';

/** `/journal`: the hub, and the areas it leads to. */
export default [
  { path: '', title: 'Journal · Lamplight', loadComponent: () => import('./journal').then((m) => m.Journal) },
  { path: 'quotes', loadChildren: () => import('../quotes/quotes.routes') },
  { path: 'notebooks', loadChildren: () => import('../notebooks/notebooks.routes') },
  { path: 'series', loadChildren: () => import('../series/series.routes') },
  { path: 'favourites', loadChildren: () => import('../favourites/favourites.routes') },
  { path: 'labels', loadChildren: () => import('../labels/labels.routes') },
] satisfies Routes;
