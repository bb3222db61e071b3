import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';

import { Auth } from '../../core/auth/auth';
import { ReadingNow } from './reading-now/reading-now';

/** The home page: what the reader is in the middle of today. */
@Component({
  selector: 'll-today',
  imports: [ReadingNow],
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
