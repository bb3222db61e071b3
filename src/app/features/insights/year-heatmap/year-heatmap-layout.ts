import { MONTH_NAMES } from '@shared/calendar/month-names';
import { yearHeatmap, type HeatmapCell } from '@shared/reading-log/year-heatmap';
import type { DailyLogEntry } from '@shared/reading-log/log-session';

/** A year of days laid out in week columns, Monday at the top (ISO 8601 weeks start on Monday). */
export interface YearHeatmapLayout {
  readonly cells: readonly (HeatmapCell & { readonly column: number; readonly row: number })[];
  /** Where each month's label ('Jan') sits: the column of the week holding its first day. */
  readonly months: readonly { readonly name: string; readonly column: number }[];
  readonly columns: number;
  /** Minutes and reading days of each month, for the table. */
  readonly totals: readonly { readonly name: string; readonly days: number; readonly minutes: number }[];
  readonly readingDays: number;
  readonly minutes: number;
  readonly fullest: HeatmapCell | null;
}

/**
 * The cells of `year` with their grid positions (1-based): row 1 is Monday, column 1 the week of
 * 1 January, however few of its days are in the year.
 *
 * @example
 * yearHeatmapLayout([], 2026).cells[0] // 1 Jan 2026 is a Thursday: { day: '2026-01-01', row: 4, column: 1, … }
 */
export function yearHeatmapLayout(log: readonly DailyLogEntry[], year: number): YearHeatmapLayout {
  const days = yearHeatmap(log, year);
  const lead = mondayBased(days[0].day);
  const cells = days.map((cell, index) => ({ ...cell, row: ((lead + index) % 7) + 1, column: Math.floor((lead + index) / 7) + 1 }));
  const months = MONTH_NAMES.map((name, index) => ({
    name: name.slice(0, 3),
    column: cells.find((cell) => Number(cell.day.slice(5, 7)) === index + 1)?.column ?? 1,
  }));
  const totals = MONTH_NAMES.map((name, index) => {
    const inMonth = cells.filter((cell) => Number(cell.day.slice(5, 7)) === index + 1);
    return { name, days: inMonth.filter((cell) => cell.minutes > 0).length, minutes: inMonth.reduce((sum, cell) => sum + cell.minutes, 0) };
  });
  const read = cells.filter((cell) => cell.minutes > 0);
  return {
    cells,
    months,
    columns: cells[cells.length - 1].column,
    totals,
    readingDays: read.length,
    minutes: read.reduce((sum, cell) => sum + cell.minutes, 0),
    fullest: read.reduce<HeatmapCell | null>((best, cell) => (best === null || cell.minutes > best.minutes ? cell : best), null),
  };
}

/** 0 for Monday … 6 for Sunday. */
function mondayBased(day: string): number {
  return (new Date(`${day}T00:00:00Z`).getUTCDay() + 6) % 7;
}
