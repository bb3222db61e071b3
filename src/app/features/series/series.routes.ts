import type { Routes } from '@angular/router';

import { unsavedWorkGuard } from '../../core/pwa/unsaved-work-guard';

/** `/journal/series`: the series and one series in order. */
export default [
  { path: '', title: 'Series · Lamplight', loadComponent: () => import('./series-list/series-list').then((m) => m.SeriesList) },
  {
    path: ':id',
    title: 'Series · Lamplight',
    canDeactivate: [unsavedWorkGuard],
    loadComponent: () => import('./series-page/series-page').then((m) => m.SeriesPage),
  },
] satisfies Routes;
