import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { MatProgressBar } from '@angular/material/progress-bar';

/**
 * An indeterminate progress bar for a request under way, named by `label`. Material's progress
 * bar loads when the bar first shows (`@defer`), so the sign-in and registration pages, which
 * show it only once the reader sends the form, do not load it with their first screen.
 */
@Component({
  selector: 'll-busy-bar',
  imports: [MatProgressBar],
  template: `
    @defer (on immediate) {
      <mat-progress-bar mode="indeterminate" [attr.aria-label]="label()" />
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class BusyBar {
  /** What is under way, for screen readers ("Signing in"). */
  readonly label = input.required<string>();
}
