import { bootstrapApplication } from '@angular/platform-browser';

import { App } from './app/app';
import { appConfig } from './app/app.config';
import { SESSION_STORAGE_KEY } from './app/core/auth/stored-session';
import { browserStorage } from './app/core/device/browser-storage';
import { preloadSignedOutPage } from './app/features/account/account.routes';

// Nobody signed in on this device: fetch the first page beside Angular's start, not after it.
if (browserStorage.read(SESSION_STORAGE_KEY) === null) preloadSignedOutPage(location.pathname);
bootstrapApplication(App, appConfig).catch((err: unknown) => console.error(err));
