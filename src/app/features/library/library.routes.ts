import type { Routes } from '@angular/router';

import { unsavedWorkGuard } from '../../core/pwa/unsaved-work-guard';

/** `/library`: the books, a book's page and its editors (a book's sessions come from the sessions area). */
export default [
  { path: '', title: 'Library · Lamplight', loadComponent: () => import('./library').then((m) => m.Library) },
  {
    path: 'new',
    title: 'Add a book · Lamplight',
    canDeactivate: [unsavedWorkGuard],
    loadComponent: () => import('./book-editor/book-editor').then((m) => m.BookEditor),
  },
  { path: ':id', title: 'Book · Lamplight', loadComponent: () => import('./book-page/book-page').then((m) => m.BookPage) },
  {
    path: ':id/edit',
    title: 'Edit book · Lamplight',
    canDeactivate: [unsavedWorkGuard],
    loadComponent: () => import('./book-editor/book-editor').then((m) => m.BookEditor),
  },
  {
    path: ':id/readings/new',
    title: 'A reading · Lamplight',
    canDeactivate: [unsavedWorkGuard],
    loadComponent: () => import('./reading-editor/reading-editor').then((m) => m.ReadingEditor),
  },
  {
    path: ':id/readings/:readingId',
    title: 'Edit reading · Lamplight',
    canDeactivate: [unsavedWorkGuard],
    loadComponent: () => import('./reading-editor/reading-editor').then((m) => m.ReadingEditor),
  },
  { path: ':id/sessions', loadChildren: () => import('../sessions/sessions.routes') },
] satisfies Routes;
