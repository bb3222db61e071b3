import type { ForecastInput } from '../forecast-finish';

/**
 * The brief's example reader, shared by the forecast specs: 300 pages left at 30 pages an hour
 * (600 minutes), 45 minutes a day, from 1 March 2026. Each spec adds its time zone.
 */
export const BRIEF_EXAMPLE: Omit<ForecastInput, 'timeZone'> = {
  remaining: 300,
  pace: { format: 'print', rate: 30 },
  minutesPerDay: 45,
  today: '2026-03-01',
};
