import { ChangeDetectionStrategy, Component } from '@angular/core';

/**
 * The minutes each shade of a reading heatmap stands for (the steps of HEATMAP_THRESHOLDS in
 * shared/reading-log/year-heatmap.ts: any reading, 15, 30, 60 minutes).
 */
export const HEATMAP_LEGEND: readonly { readonly level: number; readonly words: string }[] = [
  { level: 0, words: 'none' },
  { level: 1, words: 'under 15 min' },
  { level: 2, words: '15–30 min' },
  { level: 3, words: '30–60 min' },
  { level: 4, words: 'an hour or more' },
];

/** The key of a reading heatmap: each shade with the minutes read it stands for. */
@Component({
  selector: 'll-heatmap-legend',
  template: `
    <ul class="legend" aria-label="Minutes read in a day">
      @for (step of steps; track step.level) {
        <li><span class="swatch level-{{ step.level }}" aria-hidden="true"></span>{{ step.words }}</li>
      }
    </ul>
  `,
  styleUrl: './heatmap-legend.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class HeatmapLegend {
  protected readonly steps = HEATMAP_LEGEND;
}
