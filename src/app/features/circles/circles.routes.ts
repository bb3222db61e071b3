import type { Routes } from '@angular/router';

/** `/circles`: the reader's reading circles, joining by invitation, a circle, and a part's discussion. */
export default [
  { path: '', title: 'Reading circles · Lamplight', loadComponent: () => import('./circle-list/circle-list').then((m) => m.CircleList) },
  { path: 'join', title: 'Join a circle · Lamplight', loadComponent: () => import('./circle-join/circle-join').then((m) => m.CircleJoin) },
  {
    path: ':id',
    title: 'Circle · Lamplight',
    loadComponent: () => import('./circle-page/circle-page').then((m) => m.CirclePage),
  },
  {
    path: ':id/talk/:partId',
    title: 'Discussion · Lamplight',
    loadComponent: () => import('./part-discussion/part-discussion').then((m) => m.PartDiscussion),
  },
] satisfies Routes;
