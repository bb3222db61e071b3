import { InjectionToken } from '@angular/core';

/**
 * The reader's IANA time zone, e.g. 'Europe/Oslo': the one their days, streaks and the times they
 * type are in. From the browser by default; specs set their own so results do not depend on the
 * machine's zone.
 */
export const TIME_ZONE = new InjectionToken<string>('TIME_ZONE', {
  providedIn: 'root',
  factory: () => Intl.DateTimeFormat().resolvedOptions().timeZone,
});
