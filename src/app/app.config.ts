import { ApplicationConfig, provideBrowserGlobalErrorListeners, provideZonelessChangeDetection } from '@angular/core';
import { provideHttpClient, withInterceptors } from '@angular/common/http';
import { provideRouter, withComponentInputBinding, withRouterConfig } from '@angular/router';

import { routes } from './app.routes';
import { authInterceptor } from './core/auth/auth-interceptor';
import { provideLamplightWorker } from './core/pwa/worker-registration';

export const appConfig: ApplicationConfig = {
  providers: [
    provideBrowserGlobalErrorListeners(),
    provideZonelessChangeDetection(),
    // 'computed': when a guard keeps the reader on a page they left with Back, the history moves
    // forward again instead of replacing the entry they came from.
    provideRouter(routes, withComponentInputBinding(), withRouterConfig({ canceledNavigationResolution: 'computed' })),
    // XMLHttpRequest rather than fetch: only XHR reports upload progress (cover uploads).
    provideHttpClient(withInterceptors([authInterceptor])),
    // The icon font is set by the signed-in shell (ui/icon-font.ts): the sign-in page shows no icons.
    // Registers once a reader is signed in and the first sync is over (core/pwa/worker-registration.ts).
    ...provideLamplightWorker(),
  ],
};
