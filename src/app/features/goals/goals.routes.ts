import type { Routes } from '@angular/router';

import { unsavedWorkGuard } from '../../core/pwa/unsaved-work-guard';

/** `/goals`: the year's targets, a month, and the challenges. */
export default [
  {
    path: '',
    title: 'Goals · Lamplight',
    canDeactivate: [unsavedWorkGuard],
    loadComponent: () => import('./goals-page/goals-page').then((m) => m.GoalsPage),
  },
  { path: 'challenges', loadChildren: () => import('../challenges/challenges.routes') },
  {
    path: ':year',
    title: 'Goals · Lamplight',
    canDeactivate: [unsavedWorkGuard],
    loadComponent: () => import('./goals-page/goals-page').then((m) => m.GoalsPage),
  },
  {
    path: ':year/:month',
    title: 'A month · Lamplight',
    canDeactivate: [unsavedWorkGuard],
    loadComponent: () => import('./month-page/month-page').then((m) => m.MonthPage),
  },
] satisfies Routes;
