import { ChangeDetectionStrategy, Component, computed, ElementRef, inject, input, viewChild } from '@angular/core';
import {
  ArcElement,
  BarController,
  BarElement,
  CategoryScale,
  DoughnutController,
  Legend,
  LinearScale,
  LineController,
  LineElement,
  PointElement,
  Tooltip,
} from 'chart.js';
import { BaseChartDirective, provideCharts } from 'ng2-charts';

import { hasValues, type ChartModel } from '../chart-model';
import { chartColours } from './chart-colours';
import { chartConfig } from './chart-config';

/**
 * A chart with its text alternative: the canvas is hidden from assistive technology, and the
 * summary beneath it and a table of the same values (one tap away) say what it shows.
 */
@Component({
  selector: 'll-insights-chart',
  imports: [BaseChartDirective],
  // Only the chart.js parts our charts use, registered when the first chart loads (lazily).
  providers: [
    provideCharts({
      registerables: [
        BarController,
        BarElement,
        LineController,
        LineElement,
        PointElement,
        DoughnutController,
        ArcElement,
        CategoryScale,
        LinearScale,
        Tooltip,
        Legend,
      ],
      // Canvas text in our own font, as in the rest of the app (styles.scss).
      defaults: { font: { family: "'Atkinson Hyperlegible', system-ui, sans-serif", size: 13 } },
    }),
  ],
  templateUrl: './insights-chart.html',
  styleUrl: './insights-chart.scss',
  // A window resize or a tablet turned: measure the box again (chart.js alone can miss a box that only shrank).
  host: { '(window:resize)': 'fitToBox()', '(window:orientationchange)': 'fitToBox()' },
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class InsightsChart {
  readonly model = input.required<ChartModel>();
  /** What the chart is called in its table's caption, e.g. 'Minutes per month'. */
  readonly name = input.required<string>();

  private readonly chart = viewChild(BaseChartDirective);
  private readonly host = inject<ElementRef<HTMLElement>>(ElementRef).nativeElement;
  private readonly reduceMotion = matchMedia('(prefers-reduced-motion: reduce)').matches;

  protected readonly drawable = computed(() => hasValues(this.model()));
  protected readonly config = computed(() => chartConfig(this.model(), chartColours(this.host), this.reduceMotion));
  protected readonly rows = computed(() => {
    const { labels, series } = this.model();
    const format = this.model().format ?? ((value: number) => value.toLocaleString('en', { maximumFractionDigits: 0 }));
    return labels.map((label, index) => ({
      label,
      cells: series.map((one) => {
        const value = one.values[index];
        return value === null || value === undefined ? '—' : format(value);
      }),
    }));
  });

  /** Redraws the chart at its box's size now. */
  protected fitToBox(): void {
    this.chart()?.chart?.resize();
  }
}
