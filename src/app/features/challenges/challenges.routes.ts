import type { Routes } from '@angular/router';

import { unsavedWorkGuard } from '../../core/pwa/unsaved-work-guard';

/** `/goals/challenges`: the challenges, a new one, one challenge. */
export default [
  {
    path: '',
    title: 'Challenges · Lamplight',
    loadComponent: () => import('./challenges-list/challenges-list').then((m) => m.ChallengesList),
  },
  {
    path: 'new',
    title: 'New challenge · Lamplight',
    canDeactivate: [unsavedWorkGuard],
    loadComponent: () => import('./challenge-editor/challenge-editor').then((m) => m.ChallengeEditor),
  },
  {
    path: ':id',
    title: 'Challenge · Lamplight',
    canDeactivate: [unsavedWorkGuard],
    loadComponent: () => import('./challenge-page/challenge-page').then((m) => m.ChallengePage),
  },
] satisfies Routes;
