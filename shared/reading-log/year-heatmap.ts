import { dayFromIndex } from './day-from-index';
import { dayIndex } from './day-index';
import { DailyLogEntry } from './log-session';

/** One day of the year grid. */
export interface HeatmapCell {
  readonly day: string;
  readonly minutes: number;
  /** 0 = no reading, 4 = most. */
  readonly level: 0 | 1 | 2 | 3 | 4;
}

/**
 * Minutes from which a day reaches level 1, 2, 3 and 4. Fixed thresholds rather than quantiles
 * of the reader's own days: with quantiles one long holiday would repaint every other day of
 * the year paler, and a light year would look as full as a heavy one. With fixed minutes,
 * 30 minutes is the same shade in every year. 15/30/60 are round session lengths readers set
 * as goals (common practice); any reading at all reaches level 1.
 */
export const HEATMAP_THRESHOLDS: readonly [number, number, number, number] = [Number.MIN_VALUE, 15, 30, 60];

/**
 * One cell per calendar day of `year` (365, or 366 in a leap year), in order from 1 January,
 * with the day's minutes from the log (entries for the same day are added) and a level 0–4 by
 * `thresholds` (minutes to reach levels 1–4, default `HEATMAP_THRESHOLDS`).
 *
 * @example
 * const cells = yearHeatmap([{ day: '2028-02-29', minutes: 40, pages: 12 }], 2028);
 * cells.length // 366
 * cells[59]    // { day: '2028-02-29', minutes: 40, level: 3 }
 */
export function yearHeatmap(log: readonly DailyLogEntry[], year: number, thresholds: readonly [number, number, number, number] = HEATMAP_THRESHOLDS): HeatmapCell[] {
  if (!Number.isInteger(year) || year < 0 || year > 9999) throw new RangeError(`Not a year 0000–9999: ${year}`);
  const yyyy = String(year).padStart(4, '0');
  const first = dayIndex(`${yyyy}-01-01`);
  const last = dayIndex(`${yyyy}-12-31`);

  const minutesByDay = new Map<string, number>();
  for (const entry of log) {
    if (!entry.day.startsWith(`${yyyy}-`)) continue;
    minutesByDay.set(entry.day, (minutesByDay.get(entry.day) ?? 0) + entry.minutes);
  }

  const cells: HeatmapCell[] = [];
  for (let i = first; i <= last; i++) {
    const day = dayFromIndex(i);
    const minutes = minutesByDay.get(day) ?? 0;
    cells.push({ day, minutes, level: levelFor(minutes, thresholds) });
  }
  return cells;
}

function levelFor(minutes: number, thresholds: readonly [number, number, number, number]): HeatmapCell['level'] {
  if (minutes >= thresholds[3]) return 4;
  if (minutes >= thresholds[2]) return 3;
  if (minutes >= thresholds[1]) return 2;
  if (minutes >= thresholds[0]) return 1;
  return 0;
}
