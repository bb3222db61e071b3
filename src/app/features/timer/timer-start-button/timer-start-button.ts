import { booleanAttribute, ChangeDetectionStrategy, Component, computed, inject, input } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { RouterLink } from '@angular/router';

import { ReadingTimer } from '../reading-timer';
import { TimerStart } from '../timer-start';

/**
 * "Start reading timer" for one book, or, while its timer runs, a way back to the timer page.
 * `compact` makes it an icon button (for table rows); its label names the book.
 */
@Component({
  selector: 'll-timer-start-button',
  imports: [MatButtonModule, MatIconModule, RouterLink],
  template: `
    @if (compact()) {
      @if (timing()) {
        <a mat-icon-button routerLink="/timer" [attr.aria-label]="'Open the timer for ' + name()"><mat-icon aria-hidden="true">timer</mat-icon></a>
      } @else {
        <button mat-icon-button type="button" [attr.aria-label]="'Start the timer for ' + name()" (click)="start()">
          <mat-icon aria-hidden="true">play_arrow</mat-icon>
        </button>
      }
    } @else if (timing()) {
      <a mat-stroked-button routerLink="/timer"><mat-icon aria-hidden="true">timer</mat-icon>Open the timer</a>
    } @else {
      <button mat-stroked-button type="button" (click)="start()"><mat-icon aria-hidden="true">play_arrow</mat-icon>Start reading timer</button>
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class TimerStartButton {
  private readonly timer = inject(ReadingTimer);
  private readonly timerStart = inject(TimerStart);

  /** The book to time. */
  readonly bookId = input.required<string>();
  /** Its title, for the compact button's label. */
  readonly title = input<string | null | undefined>('');
  /** An icon button rather than a labelled one. */
  readonly compact = input(false, { transform: booleanAttribute });

  protected readonly name = computed(() => this.title() || 'this book');
  /** This book's timer is the active one. */
  protected readonly timing = computed(() => this.timer.active()?.bookId === this.bookId());

  protected start(): void {
    void this.timerStart.start(this.bookId());
  }
}
