import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { MatIconModule } from '@angular/material/icon';
import { NavigationEnd, Router, RouterLink } from '@angular/router';
import { filter, map } from 'rxjs';

import { elapsedText } from '../book-progress';
import { ReadingTimer } from '../reading-timer';
import { TimerReminders } from '../timer-reminders';

/**
 * A slim bar under the shell's toolbar while a timer runs on any device: elapsed time and the
 * book, linking to the timer page (where it is not shown). It also keeps the timer's reminders
 * working on every page.
 */
@Component({
  selector: 'll-timer-bar',
  imports: [RouterLink, MatIconModule],
  template: `
    @if (timer.active(); as active) {
      @if (!onTimerPage()) {
        <a class="timer-bar" routerLink="/timer">
          <mat-icon aria-hidden="true">{{ active.state === 'paused' ? 'pause_circle' : 'timer' }}</mat-icon>
          <span class="elapsed">{{ elapsed() }}</span>
          <span class="title">{{ timer.book()?.title || 'Reading' }}</span>
          @if (note()) {
            <span class="note">{{ note() }}</span>
          }
          <span class="visually-hidden">, open the timer</span>
        </a>
      }
    }
  `,
  styles: `
    .timer-bar {
      display: flex;
      align-items: center;
      gap: 10px;
      padding: 6px 16px;
      background: var(--mat-sys-primary-container);
      color: var(--mat-sys-on-primary-container);
      text-decoration: none;
      font: var(--mat-sys-label-large);
    }
    .elapsed {
      font-variant-numeric: tabular-nums;
      font-weight: 700;
    }
    .title {
      overflow: hidden;
      text-overflow: ellipsis;
      white-space: nowrap;
    }
    .note {
      color: var(--mat-sys-on-surface-variant);
      white-space: nowrap;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class TimerBar {
  protected readonly timer = inject(ReadingTimer);
  private readonly router = inject(Router);

  protected readonly onTimerPage = toSignal(
    this.router.events.pipe(
      filter((event) => event instanceof NavigationEnd),
      map((event) => event.urlAfterRedirects.startsWith('/timer')),
    ),
    { initialValue: this.router.url.startsWith('/timer') },
  );
  protected readonly elapsed = computed(() => elapsedText(this.timer.elapsedMs()));
  protected readonly note = computed(() => {
    if (this.timer.runningElsewhere()) return 'on another device';
    return this.timer.active()?.state === 'paused' ? 'paused' : '';
  });

  constructor() {
    inject(TimerReminders);
  }
}
