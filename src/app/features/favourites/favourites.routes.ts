import type { Routes } from '@angular/router';

/** `/journal/favourites`: favourites and the picks of each month. */
export default [
  {
    path: '',
    title: 'Favourites and picks · Lamplight',
    loadComponent: () => import('./favourites-page/favourites-page').then((m) => m.FavouritesPage),
  },
] satisfies Routes;
