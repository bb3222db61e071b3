import type { Routes } from '@angular/router';

/** `/insights`: figures for a year and the year's shelf. */
export default [
  { path: '', title: 'Insights · Lamplight', loadComponent: () => import('./insights-page/insights-page').then((m) => m.InsightsPage) },
  { path: ':year/review', title: 'The year’s shelf · Lamplight', loadComponent: () => import('./year-review/year-review').then((m) => m.YearReview) },
  { path: ':year', title: 'Insights · Lamplight', loadComponent: () => import('./insights-page/insights-page').then((m) => m.InsightsPage) },
] satisfies Routes;
