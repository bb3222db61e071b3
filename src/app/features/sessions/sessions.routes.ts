import type { Routes } from '@angular/router';

import { unsavedWorkGuard } from '../../core/pwa/unsaved-work-guard';

/** `/library/:id/sessions/…`: adding and editing a book's reading sessions. */
export default [
  {
    path: 'new',
    title: 'A reading session · Lamplight',
    canDeactivate: [unsavedWorkGuard],
    loadComponent: () => import('./session-editor/session-editor').then((m) => m.SessionEditor),
  },
  {
    path: ':sessionId',
    title: 'Edit session · Lamplight',
    canDeactivate: [unsavedWorkGuard],
    loadComponent: () => import('./session-editor/session-editor').then((m) => m.SessionEditor),
  },
] satisfies Routes;
