import { inject, InjectionToken } from '@angular/core';

import { localDay } from '@shared/calendar/local-day';

import { READER_TIME_ZONE } from '../../core/device/reader-time-zone';

/** The current instant; specs put in a fixed one. */
export const NOW = new InjectionToken<() => Date>('NOW', { providedIn: 'root', factory: () => () => new Date() });

/** The reader's local date, 'YYYY-MM-DD', in their time zone. Call in an injection context. */
export function readerToday(): string {
  return localDay(inject(NOW)().toISOString(), inject(READER_TIME_ZONE));
}
