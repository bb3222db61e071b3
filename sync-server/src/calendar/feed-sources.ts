import type { CalendarEventSource } from './calendar-event';
import { loanEvents, releaseEvents } from './loan-events';

/** Every source of the reader's calendar feed; add one here (circle meetings, say). */
export const FEED_SOURCES: readonly CalendarEventSource[] = [loanEvents, releaseEvents];
