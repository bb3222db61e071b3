import type { CalendarEventSource } from './calendar-event';
import { circleMeetingSource } from './circle-meeting-source';
import { loanEvents, releaseEvents } from './loan-events';

/** Every source of the reader's calendar feed; add one here. */
export const FEED_SOURCES: readonly CalendarEventSource[] = [loanEvents, releaseEvents, circleMeetingSource];
