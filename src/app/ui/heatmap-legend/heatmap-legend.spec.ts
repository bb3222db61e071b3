import { TestBed } from '@angular/core/testing';

import { HEATMAP_THRESHOLDS, yearHeatmap } from '@shared/reading-log/year-heatmap';

import { HeatmapLegend } from './heatmap-legend';

describe('HeatmapLegend', () => {
  it('names each shade by the minutes read, in a labelled list (no "less … more")', async () => {
    const fixture = TestBed.createComponent(HeatmapLegend);
    await fixture.whenStable();
    const list = (fixture.nativeElement as HTMLElement).querySelector('ul.legend')!;
    const words = Array.from(list.querySelectorAll('li')).map((item) => item.textContent?.trim());

    expect(list.getAttribute('aria-label')).toBe('Minutes read in a day');
    expect(words).toEqual(['none', 'under 15 min', '15–30 min', '30–60 min', 'an hour or more']);
    expect(list.textContent).not.toMatch(/Less|More/);
  });

  it('matches the shades the days get: 14 min is under 15, 15 and 59 are in their steps, 60 is an hour', () => {
    expect(HEATMAP_THRESHOLDS.slice(1)).toEqual([15, 30, 60]);
    const levels = yearHeatmap(
      [10, 14, 15, 30, 59, 60].map((minutes, index) => ({ day: `2026-01-0${index + 1}`, minutes, pages: 0 })),
      2026,
    )
      .slice(0, 6)
      .map((cell) => cell.level);
    expect(levels).toEqual([1, 1, 2, 3, 3, 4]);
  });
});
