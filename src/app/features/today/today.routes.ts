import type { Routes } from '@angular/router';

/** `/today`: what the reader is reading and their reading log. */
export default [{ path: '', title: 'Today · Lamplight', loadComponent: () => import('./today').then((m) => m.Today) }] satisfies Routes;
