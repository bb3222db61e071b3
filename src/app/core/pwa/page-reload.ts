import { InjectionToken } from '@angular/core';

/** Reloads the page. A token, so unit tests (which run inside one page) can replace it. */
export const PAGE_RELOAD = new InjectionToken<() => void>('page reload', {
  providedIn: 'root',
  factory: () => () => globalThis.location.reload(),
});
