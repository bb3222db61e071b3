import type { Routes } from '@angular/router';

/** `/journal/labels`: naming, colouring and retiring labels. */
export default [{ path: '', title: 'Labels · Lamplight', loadComponent: () => import('./labels-page/labels-page').then((m) => m.LabelsPage) }] satisfies Routes;
