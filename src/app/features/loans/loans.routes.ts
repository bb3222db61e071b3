import type { Routes } from '@angular/router';

/** `/loans`: library loans, holds and lending. */
export default [
  {
    path: '',
    title: 'Loans · Lamplight',
    loadComponent: () => import('./loans-page/loans-page').then((m) => m.LoansPage),
  },
] satisfies Routes;
