import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { ReactiveFormsModule } from '@angular/forms';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';

import { GOAL_UNITS, type GoalUnit } from '@shared/goals/goal-unit';

import { checkOnFormEvents } from '../../../ui/check-on-form-events';
import { UNIT_LABELS } from '../../../ui/goal-figures';
import type { TargetsForm } from '../targets-form';

/**
 * The year's or the month's target fields, one a unit. Its host takes no box of its own, so the
 * fields sit in the page's targets grid as the page's own fields do.
 */
@Component({
  selector: 'll-target-fields',
  imports: [ReactiveFormsModule, MatFormFieldModule, MatInputModule],
  template: `
    @for (unit of units; track unit) {
      <mat-form-field appearance="outline">
        <mat-label>{{ unitLabels[unit] }} this {{ period() }}</mat-label>
        <input matInput [formControl]="form().controls[unit]" inputmode="numeric" autocomplete="off" />
        <mat-error>Use a whole number from 1 to {{ max()[unit].toLocaleString('en') }}, or leave it blank</mat-error>
      </mat-form-field>
    }
  `,
  styles: ':host { display: contents; }',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class TargetFields {
  readonly form = input.required<TargetsForm>();
  readonly period = input.required<'year' | 'month'>();
  /** The largest target each unit takes. */
  readonly max = input.required<Readonly<Record<GoalUnit, number>>>();

  protected readonly units = GOAL_UNITS;
  protected readonly unitLabels = UNIT_LABELS;

  constructor() {
    checkOnFormEvents(this.form);
  }
}
