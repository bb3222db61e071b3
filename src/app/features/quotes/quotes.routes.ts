import type { Routes } from '@angular/router';

/** `/journal/quotes`: every quote, searchable. */
export default [{ path: '', title: 'Quotes · Lamplight', loadComponent: () => import('./quotes-page/quotes-page').then((m) => m.QuotesPage) }] satisfies Routes;
