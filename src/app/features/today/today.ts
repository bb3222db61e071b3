import { ChangeDetectionStrategy, Component, computed, inject, viewChild } from '@angular/core';

import { Auth } from '../../core/auth/auth';
import { LoansToday } from '../loans';
import { InProgress } from './in-progress/in-progress';
import { ReadingLog } from './reading-log/reading-log';

/** The home page: what the reader is in the middle of today. */
@Component({
  selector: 'll-today',
  imports: [InProgress, ReadingLog, LoansToday],
  templateUrl: './today.html',
  styleUrl: './today.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Today {
  private readonly auth = inject(Auth);
  protected readonly greeting = computed(() => {
    const hour = new Date().getHours();
    const part = hour < 5 ? 'Good night' : hour < 12 ? 'Good morning' : hour < 18 ? 'Good afternoon' : 'Good evening';
    return `${part}, ${this.auth.user()?.displayName ?? 'reader'}`;
  });

  private readonly loans = viewChild(LoansToday);
  private readonly inProgress = viewChild(InProgress);
  /**
   * The panels that can change height have read the journal once: they show together (Lighthouse
   * measured a layout shift of 0.36 otherwise). The reading log, last, pushes nothing down.
   */
  protected readonly ready = computed(() => !!(this.loans()?.loaded() && this.inProgress()?.loaded()));
}
