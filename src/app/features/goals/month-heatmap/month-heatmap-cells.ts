import { isoWeekOf } from '@shared/calendar/iso-week-of';
import type { DailyLogEntry } from '@shared/reading-log/log-session';
import { yearHeatmap, type HeatmapCell } from '@shared/reading-log/year-heatmap';

/** One day of a month's grid. */
export interface MonthHeatmapDay extends HeatmapCell {
  /** Day of the month, 1–31. */
  readonly date: number;
  readonly pages: number;
}

/** A month laid out Monday first, with its totals for the text alternative. */
export interface MonthHeatmap {
  /** Empty cells before the 1st, so it falls under its weekday (0 for a Monday). */
  readonly leading: number;
  readonly days: readonly MonthHeatmapDay[];
  readonly readingDays: number;
  readonly minutes: number;
  readonly pages: number;
  /** The day with the most minutes (the earliest of equals), or null with no reading. */
  readonly busiest: MonthHeatmapDay | null;
}

/**
 * The days of a month ('YYYY-MM') with their level from the daily log, by the same fixed
 * thresholds as the year heatmap, so a shade means the same minutes everywhere.
 *
 * @example
 * monthHeatmap('2026-06', log).leading // 0: 1 June 2026 is a Monday
 */
export function monthHeatmap(month: string, log: readonly DailyLogEntry[]): MonthHeatmap {
  const year = Number(month.slice(0, 4));
  const pagesByDay = new Map<string, number>();
  for (const entry of log) if (entry.day.startsWith(`${month}-`)) pagesByDay.set(entry.day, (pagesByDay.get(entry.day) ?? 0) + entry.pages);
  const days = yearHeatmap(log, year)
    .filter((cell) => cell.day.startsWith(`${month}-`))
    .map((cell): MonthHeatmapDay => ({ ...cell, date: Number(cell.day.slice(8)), pages: pagesByDay.get(cell.day) ?? 0 }));
  if (days.length === 0) throw new RangeError(`Not a month (YYYY-MM): ${month}`);

  let busiest: MonthHeatmapDay | null = null;
  for (const day of days) if (day.minutes > 0 && (busiest === null || day.minutes > busiest.minutes)) busiest = day;
  return {
    leading: isoWeekOf(days[0].day).weekday - 1,
    days,
    readingDays: days.filter((day) => day.minutes > 0 || day.pages > 0).length,
    minutes: days.reduce((sum, day) => sum + day.minutes, 0),
    pages: days.reduce((sum, day) => sum + day.pages, 0),
    busiest,
  };
}
