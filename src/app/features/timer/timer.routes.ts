import type { Routes } from '@angular/router';

/** `/timer`: the reading timer. */
export default [{ path: '', title: 'Reading timer · Lamplight', loadComponent: () => import('./timer-page/timer-page').then((m) => m.TimerPage) }] satisfies Routes;
