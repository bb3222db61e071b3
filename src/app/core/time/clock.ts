import { InjectionToken } from '@angular/core';

/** Time as the timer sees it: what time it is, and a way to be called again and again. */
export interface Clock {
  /** Milliseconds since the epoch, like `Date.now()`. */
  now(): number;
  /** Calls `tick` every `ms` milliseconds until the returned function is called. */
  every(ms: number, tick: () => void): () => void;
}

/** The real clock. Specs provide a fake one (see `testing/fake-clock.ts`) to control time. */
export const CLOCK = new InjectionToken<Clock>('CLOCK', {
  providedIn: 'root',
  factory: () => ({
    now: () => Date.now(),
    every: (ms, tick) => {
      const id = setInterval(tick, ms);
      return () => clearInterval(id);
    },
  }),
});

/** A clock that stands still at `ms` (for specs that need one moment, not a ticking clock). */
export function fixedClock(ms: number): Clock {
  return { now: () => ms, every: () => () => undefined };
}
