import { ChangeDetectionStrategy, Component, computed, inject, input } from '@angular/core';

import { weekdayNames } from '@shared/calendar/month-names';
import type { DailyLogEntry } from '@shared/reading-log/log-session';

import { goalAmount } from '../../../ui/goal-figures';
import { HeatmapLegend } from '../../../ui/heatmap-legend/heatmap-legend';
import { monthHeatmap } from './month-heatmap-cells';
import { ReaderSettings } from '../../../core/settings/reader-settings';

/**
 * A month's reading as a small calendar, one cell per day, darker for more minutes. It is one
 * image to assistive technology, with the month's totals as its text.
 */
@Component({
  selector: 'll-month-heatmap',
  imports: [HeatmapLegend],
  template: `
    <div class="grid" role="img" [attr.aria-label]="description()">
      @for (weekday of weekdays(); track $index) {
        <span class="weekday" aria-hidden="true">{{ weekday }}</span>
      }
      @for (blank of blanks(); track $index) {
        <span aria-hidden="true"></span>
      }
      @for (day of heatmap().days; track day.day) {
        <span class="day level-{{ day.level }}" [attr.data-day]="day.day" aria-hidden="true">{{ day.date }}</span>
      }
    </div>
    <ll-heatmap-legend />
  `,
  styleUrl: './month-heatmap.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class MonthHeatmap {
  /** The month, 'YYYY-MM'. */
  readonly month = input.required<string>();
  private readonly dates = inject(ReaderSettings);
  /** Minutes and pages per local day (more days than the month is fine). */
  readonly log = input.required<readonly DailyLogEntry[]>();

  /** Narrow weekday names in the reader's locale, Monday first. */
  protected readonly weekdays = computed(() => weekdayNames(this.dates.locale(), 'narrow'));
  protected readonly heatmap = computed(() => monthHeatmap(this.month(), this.log()));
  protected readonly blanks = computed(() => Array.from({ length: this.heatmap().leading }));

  /** The text alternative: the month's totals and its fullest day. */
  protected readonly description = computed(() => {
    const { readingDays, minutes, pages, busiest, days } = this.heatmap();
    const name = this.dates.format(this.month(), 'month');
    if (readingDays === 0) return `Reading in ${name}: no reading logged yet.`;
    const most = busiest ? ` The most on ${this.dates.format(busiest.day, 'dayMonth')}: ${goalAmount(busiest.minutes, 'minutes')}.` : '';
    return `Reading in ${name}: ${readingDays} of ${days.length} days with reading, ${goalAmount(minutes, 'minutes')} and ${goalAmount(pages, 'pages')} in all.${most}`;
  });
}
