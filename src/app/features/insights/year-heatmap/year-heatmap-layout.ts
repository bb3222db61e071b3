import { monthNames } from '@shared/calendar/month-names';
import { yearHeatmap, type HeatmapCell } from '@shared/reading-log/year-heatmap';
import type { DailyLogEntry } from '@shared/reading-log/log-session';

/** One small month calendar: its days in weekday columns, Monday first (ISO 8601 weeks start on Monday). */
export interface MonthCalendar {
  /** 1–12. */
  readonly month: number;
  readonly name: string;
  /** Empty places before the 1st, so it sits under its weekday. */
  readonly leading: number;
  /** The month's days; `column` 1 is Monday, `week` 1 the row of the 1st. */
  readonly cells: readonly (HeatmapCell & { readonly column: number; readonly week: number })[];
  readonly days: number;
  readonly minutes: number;
}

/** The year as twelve small month calendars, and its totals. */
export interface YearHeatmapLayout {
  readonly months: readonly MonthCalendar[];
  /** Every day of the year in order, for counts. */
  readonly cells: readonly HeatmapCell[];
  readonly readingDays: number;
  readonly minutes: number;
  readonly fullest: HeatmapCell | null;
}

/**
 * The days of `year` as twelve month calendars, each day under its weekday; month names in
 * `locale` (the reader's, from Settings).
 *
 * @example
 * yearHeatmapLayout([], 2026).months[0] // January 2026 starts on a Thursday: { leading: 3, cells[0]: { column: 4, week: 1 } … }
 */
export function yearHeatmapLayout(log: readonly DailyLogEntry[], year: number, locale = 'en-GB'): YearHeatmapLayout {
  const cells = yearHeatmap(log, year);
  const months = monthNames(locale).map((name, index): MonthCalendar => {
    const inMonth = cells.filter((cell) => Number(cell.day.slice(5, 7)) === index + 1);
    const leading = mondayBased(inMonth[0]!.day);
    return {
      month: index + 1,
      name,
      leading,
      cells: inMonth.map((cell, day) => ({ ...cell, column: ((leading + day) % 7) + 1, week: Math.floor((leading + day) / 7) + 1 })),
      days: inMonth.filter((cell) => cell.minutes > 0).length,
      minutes: inMonth.reduce((sum, cell) => sum + cell.minutes, 0),
    };
  });
  const read = cells.filter((cell) => cell.minutes > 0);
  return {
    months,
    cells,
    readingDays: read.length,
    minutes: read.reduce((sum, cell) => sum + cell.minutes, 0),
    fullest: read.reduce<HeatmapCell | null>((best, cell) => (best === null || cell.minutes > best.minutes ? cell : best), null),
  };
}

/** 0 for Monday … 6 for Sunday. */
function mondayBased(day: string): number {
  return (new Date(`${day}T00:00:00Z`).getUTCDay() + 6) % 7;
}
