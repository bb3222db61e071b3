import { Routes } from '@angular/router';

import { adminGuard, signedInGuard, signedOutGuard } from './core/auth/auth-guards';
import { unsavedWorkGuard } from './core/pwa/unsaved-work-guard';

export const routes: Routes = [
  {
    path: 'sign-in',
    title: 'Sign in · Lamplight',
    canMatch: [signedOutGuard],
    loadComponent: () => import('./features/account/sign-in/sign-in').then((m) => m.SignIn),
  },
  {
    path: 'register',
    title: 'Create your journal · Lamplight',
    canMatch: [signedOutGuard],
    loadComponent: () => import('./features/account/register/register').then((m) => m.Register),
  },
  {
    path: 'forgot-password',
    title: 'Choose a new password · Lamplight',
    loadComponent: () => import('./features/account/forgot-password/forgot-password').then((m) => m.ForgotPassword),
  },
  {
    path: 'reset-password',
    title: 'Choose a new password · Lamplight',
    loadComponent: () => import('./features/account/reset-password/reset-password').then((m) => m.ResetPassword),
  },
  {
    path: 'verify-email',
    title: 'Confirm your e-mail address · Lamplight',
    loadComponent: () => import('./features/account/verify-email/verify-email').then((m) => m.VerifyEmail),
  },
  {
    path: '',
    canMatch: [signedInGuard],
    children: [
      { path: '', pathMatch: 'full', redirectTo: 'today' },
      {
        path: 'today',
        title: 'Today · Lamplight',
        loadComponent: () => import('./features/today/today').then((m) => m.Today),
      },
      {
        path: 'library',
        children: [
          {
            path: '',
            title: 'Library · Lamplight',
            loadComponent: () => import('./features/library/library').then((m) => m.Library),
          },
          {
            path: 'new',
            title: 'Add a book · Lamplight',
            canDeactivate: [unsavedWorkGuard],
            loadComponent: () => import('./features/library/book-editor/book-editor').then((m) => m.BookEditor),
          },
          {
            path: ':id',
            title: 'Book · Lamplight',
            loadComponent: () => import('./features/library/book-page/book-page').then((m) => m.BookPage),
          },
          {
            path: ':id/edit',
            title: 'Edit book · Lamplight',
            canDeactivate: [unsavedWorkGuard],
            loadComponent: () => import('./features/library/book-editor/book-editor').then((m) => m.BookEditor),
          },
          {
            path: ':id/readings/new',
            title: 'A reading · Lamplight',
            canDeactivate: [unsavedWorkGuard],
            loadComponent: () => import('./features/library/reading-editor/reading-editor').then((m) => m.ReadingEditor),
          },
          {
            path: ':id/readings/:readingId',
            title: 'Edit reading · Lamplight',
            canDeactivate: [unsavedWorkGuard],
            loadComponent: () => import('./features/library/reading-editor/reading-editor').then((m) => m.ReadingEditor),
          },
          {
            path: ':id/sessions/new',
            title: 'A reading session · Lamplight',
            canDeactivate: [unsavedWorkGuard],
            loadComponent: () => import('./features/sessions/session-editor/session-editor').then((m) => m.SessionEditor),
          },
          {
            path: ':id/sessions/:sessionId',
            title: 'Edit session · Lamplight',
            canDeactivate: [unsavedWorkGuard],
            loadComponent: () => import('./features/sessions/session-editor/session-editor').then((m) => m.SessionEditor),
          },
        ],
      },
      {
        path: 'journal',
        children: [
          { path: '', title: 'Journal · Lamplight', loadComponent: () => import('./features/journal/journal').then((m) => m.Journal) },
          {
            path: 'quotes',
            title: 'Quotes · Lamplight',
            loadComponent: () => import('./features/quotes/quotes-page/quotes-page').then((m) => m.QuotesPage),
          },
          {
            path: 'notebooks',
            title: 'Notebooks · Lamplight',
            canDeactivate: [unsavedWorkGuard],
            loadComponent: () => import('./features/notebooks/notebooks-page/notebooks-page').then((m) => m.NotebooksPage),
          },
          {
            path: 'series',
            title: 'Series · Lamplight',
            loadComponent: () => import('./features/series/series-list/series-list').then((m) => m.SeriesList),
          },
          {
            path: 'series/:id',
            title: 'Series · Lamplight',
            canDeactivate: [unsavedWorkGuard],
            loadComponent: () => import('./features/series/series-page/series-page').then((m) => m.SeriesPage),
          },
          {
            path: 'favourites',
            title: 'Favourites and picks · Lamplight',
            loadComponent: () => import('./features/favourites/favourites-page/favourites-page').then((m) => m.FavouritesPage),
          },
          {
            path: 'labels',
            title: 'Labels · Lamplight',
            loadComponent: () => import('./features/labels/labels-page/labels-page').then((m) => m.LabelsPage),
          },
          {
            path: 'notebooks/:id',
            title: 'Notebook · Lamplight',
            canDeactivate: [unsavedWorkGuard],
            loadComponent: () => import('./features/notebooks/notebook-view/notebook-view').then((m) => m.NotebookView),
          },
          {
            path: 'notebooks/:id/pages/:pageId',
            title: 'Notebook page · Lamplight',
            canDeactivate: [unsavedWorkGuard],
            loadComponent: () => import('./features/notebooks/page-editor/page-editor').then((m) => m.PageEditor),
          },
        ],
      },
      {
        path: 'goals',
        children: [
          { path: '', title: 'Goals · Lamplight', canDeactivate: [unsavedWorkGuard], loadComponent: () => import('./features/goals/goals-page/goals-page').then((m) => m.GoalsPage) },
          {
            path: 'challenges',
            title: 'Challenges · Lamplight',
            loadComponent: () => import('./features/challenges/challenges-list/challenges-list').then((m) => m.ChallengesList),
          },
          {
            path: 'challenges/new',
            title: 'New challenge · Lamplight',
            canDeactivate: [unsavedWorkGuard],
            loadComponent: () => import('./features/challenges/challenge-editor/challenge-editor').then((m) => m.ChallengeEditor),
          },
          {
            path: 'challenges/:id',
            title: 'Challenge · Lamplight',
            canDeactivate: [unsavedWorkGuard],
            loadComponent: () => import('./features/challenges/challenge-page/challenge-page').then((m) => m.ChallengePage),
          },
          { path: ':year', title: 'Goals · Lamplight', canDeactivate: [unsavedWorkGuard], loadComponent: () => import('./features/goals/goals-page/goals-page').then((m) => m.GoalsPage) },
          {
            path: ':year/:month',
            title: 'A month · Lamplight',
            canDeactivate: [unsavedWorkGuard],
            loadComponent: () => import('./features/goals/month-page/month-page').then((m) => m.MonthPage),
          },
        ],
      },
      {
        path: 'insights',
        children: [
          { path: '', title: 'Insights · Lamplight', loadComponent: () => import('./features/insights/insights-page/insights-page').then((m) => m.InsightsPage) },
          {
            path: ':year/review',
            title: 'Year in review · Lamplight',
            loadComponent: () => import('./features/insights/year-review/year-review').then((m) => m.YearReview),
          },
          { path: ':year', title: 'Insights · Lamplight', loadComponent: () => import('./features/insights/insights-page/insights-page').then((m) => m.InsightsPage) },
        ],
      },
      {
        path: 'timer',
        title: 'Reading timer · Lamplight',
        loadComponent: () => import('./features/timer/timer-page/timer-page').then((m) => m.TimerPage),
      },
      {
        path: 'settings',
        title: 'Settings · Lamplight',
        loadComponent: () => import('./features/settings/settings').then((m) => m.Settings),
      },
      {
        path: 'admin',
        canMatch: [adminGuard],
        children: [
          {
            path: '',
            title: 'Accounts · Lamplight',
            loadComponent: () => import('./features/admin/accounts/accounts').then((m) => m.Accounts),
          },
          {
            path: 'mail',
            title: 'Caught mail · Lamplight',
            loadComponent: () => import('./features/admin/mail/mail').then((m) => m.Mail),
          },
        ],
      },
    ],
  },
  {
    path: '**',
    title: 'Not found · Lamplight',
    loadComponent: () => import('./features/not-found/not-found').then((m) => m.NotFound),
  },
];
