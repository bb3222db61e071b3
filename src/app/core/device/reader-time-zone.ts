import { InjectionToken } from '@angular/core';

/**
 * The reader's IANA time zone ('Europe/Lisbon'), which decides what "today" and "this month"
 * are. This device's zone by default; specs provide a fixed one.
 */
export const READER_TIME_ZONE = new InjectionToken<string>('READER_TIME_ZONE', {
  providedIn: 'root',
  factory: () => Intl.DateTimeFormat().resolvedOptions().timeZone,
});
