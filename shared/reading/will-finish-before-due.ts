import { dayIndex } from '../reading-log/day-index';
import { ForecastInput, forecastFinish } from './forecast-finish';

/** A forecast's inputs plus the due date. */
export interface DueForecastInput extends ForecastInput {
  /** Last local day, 'YYYY-MM-DD', on which finishing still counts (a library loan's due date). */
  readonly dueDate: string;
}

/** Whether the book will be finished in time, and what it would take. */
export interface DueForecast {
  /** Whether the forecast finish date is on or before the due date. */
  readonly likely: boolean;
  readonly finishDate: string | null;
  readonly dueDate: string;
  /** Days to spare (negative: days late); null when no finish date can be foreseen. */
  readonly marginDays: number | null;
  /** Minutes a day needed from today through the due date; null when the due date has passed. */
  readonly minutesPerDayNeeded: number | null;
}

/**
 * Whether the reader is on course to finish by a due date, and how many minutes a day would
 * get them there. Today and the due date both count as reading days, matching
 * `forecastFinish`, so while there is reading left and the due date is not past, `likely`
 * holds exactly when `minutesPerDay` ≥ `minutesPerDayNeeded` (up to float rounding).
 *
 * @example
 * // 600 minutes left, 14 days from 1 to 14 March: 600 / 14 ≈ 42.9 min/day needed; 45 is enough.
 * willFinishBeforeDue({ remaining: 300, pace: { format: 'print', rate: 30 }, minutesPerDay: 45,
 *                       today: '2026-03-01', timeZone: 'UTC', dueDate: '2026-03-14' })
 * // { likely: true, finishDate: '2026-03-14', dueDate: '2026-03-14', marginDays: 0, minutesPerDayNeeded: 42.857… }
 */
export function willFinishBeforeDue(input: DueForecastInput): DueForecast {
  const forecast = forecastFinish(input);
  const due = dayIndex(input.dueDate);
  const daysAvailable = due - dayIndex(input.today) + 1;
  const minutesPerDayNeeded = forecast.minutesLeft === 0 ? 0 : daysAvailable > 0 ? forecast.minutesLeft / daysAvailable : null;
  const finishDate = forecast.finishDate;
  return {
    likely: finishDate !== null && finishDate <= input.dueDate,
    finishDate,
    dueDate: input.dueDate,
    marginDays: finishDate === null ? null : due - dayIndex(finishDate),
    minutesPerDayNeeded,
  };
}
