import type { Routes } from '@angular/router';

/** `/loans`: library loans, holds and lending; `/loans/wishlist`: books wanted and releases ahead. */
export default [
  {
    path: '',
    title: 'Loans · Lamplight',
    loadComponent: () => import('./loans-page/loans-page').then((m) => m.LoansPage),
  },
  {
    path: 'wishlist',
    title: 'Wishlist and coming out · Lamplight',
    loadComponent: () => import('./wishlist-page/wishlist-page').then((m) => m.WishlistPage),
  },
] satisfies Routes;
