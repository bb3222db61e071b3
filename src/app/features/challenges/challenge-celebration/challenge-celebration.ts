import { ChangeDetectionStrategy, Component, input, output } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';

/**
 * A small, warm banner for a challenge just finished: it rises in and its lamp glows a few
 * times (still, for readers who ask for reduced motion). Shown once per challenge; see
 * `celebrateOnce`.
 */
@Component({
  selector: 'll-challenge-celebration',
  imports: [MatButtonModule, MatIconModule],
  template: `
    <div class="celebration" role="status">
      <span class="lamp" aria-hidden="true"><mat-icon>emoji_events</mat-icon></span>
      <div class="words">
        <p class="title">Challenge finished</p>
        <p>You finished “{{ name() }}”. Well read.</p>
      </div>
      <button mat-button type="button" (click)="dismissed.emit()">Close</button>
    </div>
  `,
  styleUrl: './challenge-celebration.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ChallengeCelebration {
  /** The challenge's name. */
  readonly name = input.required<string>();
  /** The reader closed the banner. */
  readonly dismissed = output<void>();
}
