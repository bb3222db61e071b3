import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { RouterLink } from '@angular/router';

/** Links to the years either side of the one a page shows (`/goals/2025`, `/goals/2027`). */
@Component({
  selector: 'll-year-nav',
  imports: [RouterLink, MatButtonModule, MatIconModule],
  template: `
    <nav class="years" aria-label="Other years">
      <a mat-button [routerLink]="[area(), '' + (year() - 1)]"><mat-icon aria-hidden="true">chevron_left</mat-icon>{{ year() - 1 }}</a>
      <a mat-button [routerLink]="[area(), '' + (year() + 1)]">{{ year() + 1 }}<mat-icon aria-hidden="true" iconPositionEnd>chevron_right</mat-icon></a>
    </nav>
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class YearNav {
  readonly year = input.required<number>();
  /** The area's route, which takes the year after it: '/goals'. */
  readonly area = input.required<string>();
}
