import type { Routes } from '@angular/router';

import { unsavedWorkGuard } from '../../core/pwa/unsaved-work-guard';

/** `/journal/notebooks`: the notebooks, one notebook, one page. */
export default [
  {
    path: '',
    title: 'Notebooks · Lamplight',
    canDeactivate: [unsavedWorkGuard],
    loadComponent: () => import('./notebooks-page/notebooks-page').then((m) => m.NotebooksPage),
  },
  {
    path: ':id',
    title: 'Notebook · Lamplight',
    canDeactivate: [unsavedWorkGuard],
    loadComponent: () => import('./notebook-view/notebook-view').then((m) => m.NotebookView),
  },
  {
    path: ':id/pages/:pageId',
    title: 'Notebook page · Lamplight',
    canDeactivate: [unsavedWorkGuard],
    loadComponent: () => import('./page-editor/page-editor').then((m) => m.PageEditor),
  },
] satisfies Routes;
