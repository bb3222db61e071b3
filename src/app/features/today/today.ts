import { LoansToday } from '../loans';
import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';

import { Auth } from '../../core/auth/auth';
import { InProgress } from './in-progress/in-progress';
import { ReadingLog } from './reading-log/reading-log';

/** The home page: what the reader is in the middle of today. */
@Component({
  selector: 'll-today',
  imports: [InProgress, ReadingLog, LoansToday],
  templateUrl: './today.html',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Today {
  private readonly auth = inject(Auth);
  protected readonly greeting = computed(() => {
    const hour = new Date().getHours();
    const part = hour < 5 ? 'Good night' : hour < 12 ? 'Good morning' : hour < 18 ? 'Good afternoon' : 'Good evening';
    return `${part}, ${this.auth.user()?.displayName ?? 'reader'}`;
  });
}
