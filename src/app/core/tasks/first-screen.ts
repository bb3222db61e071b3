import { afterNextRender, InjectionToken, signal, type Signal } from '@angular/core';

/** Background work at start waits at most this long for an idle moment after the first render. */
const IDLE_TIMEOUT_MS = 2000;

/**
 * True once the app has rendered its first screen and the browser has had an idle moment (or
 * {@link IDLE_TIMEOUT_MS} passed). Work the first screen does not show — the first sync round,
 * its live event stream — waits for it, so its requests, IndexedDB writes and the re-renders
 * they wake do not land in the same busy stretch as the first screen's own reads (issue 17:
 * Lighthouse counts every long task of that stretch, times four). Specs provide `signal(true)`.
 */
export const FIRST_SCREEN_SETTLED = new InjectionToken<Signal<boolean>>('the first screen has rendered and the browser was idle', {
  providedIn: 'root',
  factory: () => {
    const settled = signal(false);
    afterNextRender(() => {
      const done = () => settled.set(true);
      if (typeof globalThis.requestIdleCallback === 'function') globalThis.requestIdleCallback(done, { timeout: IDLE_TIMEOUT_MS });
      else setTimeout(done, 0);
    });
    return settled.asReadonly();
  },
});
