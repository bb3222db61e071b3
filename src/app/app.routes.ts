import { Routes } from '@angular/router';

import { adminGuard, signedInGuard } from './core/auth/auth-guards';
import accountRoutes from './features/account/account.routes';

/** The areas of the app; each keeps its own route table beside its pages (`features/NAME/NAME.routes.ts`). */
export const routes: Routes = [
  // Spread, not lazy: an empty-path lazy group at the root would sit in front of the redirect from '/'.
  ...accountRoutes,
  {
    path: '',
    canMatch: [signedInGuard],
    children: [
      { path: '', pathMatch: 'full', redirectTo: 'today' },
      { path: 'today', loadChildren: () => import('./features/today/today.routes') },
      { path: 'library', loadChildren: () => import('./features/library/library.routes') },
      { path: 'loans', loadChildren: () => import('./features/loans/loans.routes') },
      { path: 'journal', loadChildren: () => import('./features/journal/journal.routes') },
      { path: 'goals', loadChildren: () => import('./features/goals/goals.routes') },
      { path: 'insights', loadChildren: () => import('./features/insights/insights.routes') },
      { path: 'circles', loadChildren: () => import('./features/circles/circles.routes') },
      { path: 'timer', loadChildren: () => import('./features/timer/timer.routes') },
      { path: 'settings', loadChildren: () => import('./features/settings/settings.routes') },
      { path: 'admin', canMatch: [adminGuard], loadChildren: () => import('./features/admin/admin.routes') },
    ],
  },
  { path: '**', title: 'Not found · Lamplight', loadComponent: () => import('./features/not-found').then((m) => m.NotFound) },
];
