import { inject, Injectable } from '@angular/core';
import { Router } from '@angular/router';
import { firstValueFrom } from 'rxjs';

import { JournalStore } from '../../core/data/journal-store';
import { minutesWords } from './book-progress';
import type { ConfirmDialog, ConfirmDialogData } from '../../ui/confirm-dialog/confirm-dialog';
import { LazyOverlays } from '../../ui/lazy-overlays';
import { ReadingTimer } from './reading-timer';

/**
 * Starting the timer from a start button: one timer per reader, so when another book's timer is
 * active the reader is asked first, and saying yes stops it into a session. Then the timer page
 * opens.
 */
@Injectable({ providedIn: 'root' })
export class TimerStart {
  private readonly timer = inject(ReadingTimer);
  private readonly store = inject(JournalStore);
  private readonly overlays = inject(LazyOverlays);
  private readonly router = inject(Router);

  /** Starts timing `bookId` (or opens its timer when it already runs); `false` when the reader said no. */
  async start(bookId: string, options: { targetMinutes?: number | null } = {}): Promise<boolean> {
    const outcome = await this.timer.start(bookId, options);
    if (!outcome.started && outcome.current.bookId !== bookId) {
      const [current, next] = await Promise.all([this.titleOf(outcome.current.bookId), this.titleOf(bookId)]);
      const data: ConfirmDialogData = {
        title: 'A timer is already running',
        message: `You are timing ${current}. Stop it and keep its time as a session, then start timing ${next}?`,
        yes: 'Stop it and start',
        no: 'Keep the current one',
      };
      const { ConfirmDialog } = await import('../../ui/confirm-dialog/confirm-dialog');
      const ref = await this.overlays.dialog<ConfirmDialog, ConfirmDialogData, boolean>(ConfirmDialog, { data, width: '440px' });
      if (!(await firstValueFrom(ref.afterClosed()))) return false;
      const replaced = await this.timer.start(bookId, { ...options, replace: true });
      if (replaced.started && replaced.stoppedSessionId) {
        const session = await this.store.get('sessions', replaced.stoppedSessionId);
        void this.overlays.snackBar(`Saved ${minutesWords(session?.activeMinutes)} of ${current}.`, 'OK', { duration: 6000 });
      }
    }
    await this.router.navigateByUrl('/timer');
    return true;
  }

  private async titleOf(bookId: string | null | undefined): Promise<string> {
    const book = bookId ? await this.store.get('books', bookId) : undefined;
    return book?.title || 'another book';
  }
}
