import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';

import type { GoalUnit } from '@shared/goals/goal-unit';

import { goalAmount, goalFigure } from '../../../ui/goal-figures';

/** Where the bar's fill ends and the marker stands, in percent of the target (both 0–100). */
export function paceBarGeometry(actual: number, expectedByToday: number, target: number): { done: number; marker: number } {
  const percent = (value: number) => Math.min(Math.max((value / target) * 100, 0), 100);
  return { done: percent(actual), marker: percent(expectedByToday) };
}

/**
 * Lamplight's picture of a yearly goal: one bar filled to what the reader has read, with a small
 * lamp-post marker where an even pace through the year would be today.
 */
@Component({
  selector: 'll-pace-bar',
  templateUrl: './pace-bar.html',
  styleUrl: './pace-bar.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PaceBar {
  readonly actual = input.required<number>();
  readonly expectedByToday = input.required<number>();
  readonly target = input.required<number>();
  readonly unit = input.required<GoalUnit>();

  protected readonly geometry = computed(() => paceBarGeometry(this.actual(), this.expectedByToday(), this.target()));
  protected readonly description = computed(
    () =>
      `${goalFigure(this.actual(), this.unit())} of ${goalAmount(this.target(), this.unit())} read; ` +
      `an even pace would be at ${goalFigure(this.expectedByToday(), this.unit())} today.`,
  );
}
