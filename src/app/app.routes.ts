import { Routes } from '@angular/router';

export const routes: Routes = [
  { path: '', pathMatch: 'full', redirectTo: 'today' },
  {
    path: 'today',
    title: 'Today · Lamplight',
    loadComponent: () => import('./features/today/today').then((m) => m.Today),
  },
  {
    path: 'library',
    title: 'Library · Lamplight',
    loadComponent: () => import('./features/library/library').then((m) => m.Library),
  },
  {
    path: '**',
    title: 'Not found · Lamplight',
    loadComponent: () => import('./features/not-found/not-found').then((m) => m.NotFound),
  },
];
