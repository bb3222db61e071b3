import { inject } from '@angular/core';

import { localDay } from '@shared/calendar/local-day';

import { CLOCK } from './clock';
import { TIME_ZONE } from './time-zone';

/** The reader's local date, 'YYYY-MM-DD', in their time zone. Call in an injection context. */
export function readerToday(): string {
  return localDay(new Date(inject(CLOCK).now()).toISOString(), inject(TIME_ZONE));
}
