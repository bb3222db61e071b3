/** One chart of the insights, with the text that stands in for it. */
export interface ChartModel {
  readonly kind: 'bar' | 'horizontal-bar' | 'line' | 'doughnut';
  /** The category of each value: months, formats, ratings, terms. */
  readonly labels: readonly string[];
  readonly series: readonly ChartSeries[];
  /** A sentence or two saying what the chart shows: its text alternative. */
  readonly summary: string;
  /** How a value is written in the table (default: whole numbers with separators). */
  readonly format?: (value: number) => string;
}

export interface ChartSeries {
  readonly label: string;
  /** One per label; null where there is nothing to show (a month without timed pages). */
  readonly values: readonly (number | null)[];
}

/** Whether a chart has anything to draw. */
export function hasValues(model: ChartModel): boolean {
  return model.series.some((series) => series.values.some((value) => value !== null && value > 0));
}
