import type { Provider } from '@angular/core';

import { CLOCK, fixedClock } from '../time/clock';
import { TIME_ZONE } from '../time/time-zone';

/**
 * Providers for a reader who stands at one moment (`ms`) in one time zone. Los Angeles by default:
 * there a UTC evening is still the day before, which catches a day counted in the wrong zone.
 */
export function readerAt(ms: number, timeZone = 'America/Los_Angeles'): Provider[] {
  return [
    { provide: TIME_ZONE, useValue: timeZone },
    { provide: CLOCK, useValue: fixedClock(ms) },
  ];
}

/** Empties the CDK overlay container, so a dialog or snackbar a spec left open cannot reach the next. */
export function clearOverlays(): void {
  document.querySelectorAll('.cdk-overlay-container').forEach((overlay) => (overlay.innerHTML = ''));
}
