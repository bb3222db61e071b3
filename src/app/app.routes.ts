import { Routes } from '@angular/router';

import { adminGuard, signedInGuard } from './core/auth/auth-guards';
import accountRoutes from './features/account/account.routes';
import { ICON_FONT_FAMILY } from './ui/icon-font-names';

/** The signed-in reader's areas, each its own lazy chunk; keyed by the first segment of the path. */
const signedInAreas = [
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
] satisfies Routes;

/** The areas of the app; each keeps its own route table beside its pages (`features/NAME/NAME.routes.ts`). */
export const routes: Routes = [
  // Spread, not lazy: an empty-path lazy group at the root would sit in front of the redirect from '/'.
  ...accountRoutes,
  {
    path: '',
    canMatch: [signedInGuard],
    children: [{ path: '', pathMatch: 'full', redirectTo: 'today' }, ...signedInAreas],
  },
  { path: '**', title: 'Not found · Lamplight', loadComponent: () => import('./features/not-found').then((m) => m.NotFound) },
];

/**
 * Starts loading what a signed-in reader opening `path` sees first — the shell (sync, the local
 * journal, the bars), the area of the page and the icon font — while Angular starts, rather than
 * once the app has bootstrapped and rendered (a third of a second later on this machine). The
 * `@defer` block, the router and the icons reuse what this fetched.
 */
export function preloadSignedInPage(path: string): void {
  const later = () => undefined; // a fetch that fails here fails again where it is used, and is reported there
  import('./signed-in-shell').catch(later);
  globalThis.document?.fonts?.load(`24px '${ICON_FONT_FAMILY}'`).catch(later);
  const area = path.split('/')[1] || 'today';
  signedInAreas
    .find((route) => route.path === area)
    ?.loadChildren()
    .catch(later);
}
