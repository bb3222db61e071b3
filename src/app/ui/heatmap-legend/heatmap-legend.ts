import { ChangeDetectionStrategy, Component } from '@angular/core';

/** The key of a reading heatmap: its five shades from less to more. Decorative: each heatmap says its figures in words. */
@Component({
  selector: 'll-heatmap-legend',
  template: `
    <p class="legend" aria-hidden="true">
      Less
      @for (level of levels; track level) {
        <span class="swatch level-{{ level }}"></span>
      }
      More
    </p>
  `,
  styleUrl: './heatmap-legend.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class HeatmapLegend {
  protected readonly levels = [0, 1, 2, 3, 4];
}
