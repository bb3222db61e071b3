import { ChangeDetectionStrategy, Component, computed, inject, input } from '@angular/core';

import type { DailyLogEntry } from '@shared/reading-log/log-session';

import { HeatmapLegend } from '../../../ui/heatmap-legend/heatmap-legend';
import { yearHeatmapLayout } from './year-heatmap-layout';
import { ReaderSettings } from '../../../core/settings/reader-settings';

/**
 * Every day of a year as a small square, darker for more minutes, in week columns. The grid is
 * hidden from assistive technology; the summary and a table of months stand in for it.
 */
@Component({
  selector: 'll-year-heatmap',
  imports: [HeatmapLegend],
  templateUrl: './year-heatmap.html',
  styleUrl: './year-heatmap.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class YearHeatmap {
  readonly year = input.required<number>();
  protected readonly dates = inject(ReaderSettings);
  /** Minutes and pages per local day (other years are fine). */
  readonly log = input.required<readonly DailyLogEntry[]>();

  protected readonly layout = computed(() => yearHeatmapLayout(this.log(), this.year(), this.dates.locale()));

  protected readonly summary = computed(() => {
    const { readingDays, minutes, fullest, cells } = this.layout();
    if (readingDays === 0) return `No reading sessions logged in ${this.year()} yet.`;
    const most = fullest ? ` The fullest day: ${this.dates.format(fullest.day, 'dayMonth')}, ${duration(fullest.minutes)}.` : '';
    return `${readingDays} of ${cells.length} days with reading in ${this.year()}, ${duration(minutes)} in all.${most}`;
  });

  protected readonly duration = duration;
}

/** '2 h 05 min', or '45 min' under an hour. */
function duration(minutes: number): string {
  const whole = Math.round(minutes);
  if (whole < 60) return `${whole} min`;
  return `${Math.floor(whole / 60).toLocaleString('en')} h ${String(whole % 60).padStart(2, '0')} min`;
}
