import { InjectionToken } from '@angular/core';

/** Milliseconds since the epoch, now. `Date.now` by default; specs fix the moment. */
export const CLOCK = new InjectionToken<() => number>('CLOCK', {
  providedIn: 'root',
  factory: () => Date.now,
});
