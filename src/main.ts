import { bootstrapApplication } from '@angular/platform-browser';

import { App } from './app/app';
import { appConfig } from './app/app.config';
import { preloadSignedInPage } from './app/app.routes';
import { SESSION_STORAGE_KEY } from './app/core/auth/stored-session';
import { browserStorage } from './app/core/device/browser-storage';
import { preloadSignedOutPage } from './app/features/account/account.routes';

// Fetch the first page beside Angular's start, not after it.
if (browserStorage.read(SESSION_STORAGE_KEY) === null) preloadSignedOutPage(location.pathname);
else preloadSignedInPage(location.pathname);
bootstrapApplication(App, appConfig).catch((err: unknown) => console.error(err));
