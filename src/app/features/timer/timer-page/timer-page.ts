import { ChangeDetectionStrategy, Component, computed, effect, inject, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSlideToggleModule } from '@angular/material/slide-toggle';
import { RouterLink } from '@angular/router';
import { format } from 'date-fns';
import { firstValueFrom } from 'rxjs';

import { liveQuerySignal } from '../../../core/data/live-query';
import { UnsavedWork } from '../../../core/pwa/unsaved-work';
import { QuoteCapture } from '../../quotes';
import { elapsedText, latestSession, minutesWords, positionUnit, progressFraction, progressLine } from '../book-progress';
import { ConfirmDialog, type ConfirmDialogData } from '../../../ui/confirm-dialog/confirm-dialog';
import { ReadingTimer } from '../reading-timer';
import { NO_TIMER_PAGE_DATA, timerPageData } from '../timer-data';
import { ScreenAwake } from '../screen-awake';
import { StopDialog, type StopDialogData } from '../stop-dialog/stop-dialog';
import { TimerReminders } from '../timer-reminders';
import { ReaderDatePipe } from '../../../ui/reader-date';

/** Targets on offer, in minutes. */
const TARGETS = [10, 15, 20, 30, 45, 60, 90, 120];

/**
 * The reading timer, large and calm: elapsed time, the book and how far through it the reader
 * is, pause and resume, stop (then a short form), discard, a target with a gentle notification,
 * keeping the screen on, a quote in one tap and a break suggestion now and then.
 */
@Component({
  selector: 'll-timer-page',
  imports: [ReaderDatePipe, RouterLink, MatButtonModule, MatFormFieldModule, MatIconModule, MatInputModule, MatProgressBarModule, MatSlideToggleModule],
  providers: [ScreenAwake],
  templateUrl: './timer-page.html',
  styleUrl: './timer-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class TimerPage {
  protected readonly timer = inject(ReadingTimer);
  protected readonly reminders = inject(TimerReminders);
  protected readonly awake = inject(ScreenAwake);
  private readonly quotes = inject(QuoteCapture);
  private readonly dialog = inject(MatDialog);
  /** The stop form is open: an app update must not reload over it. */
  private readonly stopFormOpen = signal(false);

  private readonly data = liveQuerySignal(timerPageData, NO_TIMER_PAGE_DATA);

  protected readonly active = this.timer.active;
  protected readonly book = this.timer.book;
  protected readonly elsewhere = this.timer.runningElsewhere;
  protected readonly elapsed = computed(() => elapsedText(this.timer.elapsedMs()));
  /** Where the reader is in the book: their latest session's end, else where this timer started. */
  protected readonly position = computed(() => {
    const timer = this.active();
    if (!timer?.bookId) return null;
    return latestSession(this.data().bookSessions, timer.bookId, { having: 'toPosition' })?.toPosition ?? timer.startPosition ?? null;
  });
  protected readonly progress = computed(() => progressLine(this.book(), this.position()));
  /** Whole percent through the book, or `null` when its length is unknown. */
  protected readonly percent = computed(() => {
    const fraction = progressFraction(this.book(), this.position());
    return fraction === null ? null : Math.round(fraction * 100);
  });
  protected readonly since = computed(() => {
    const startedAt = this.active()?.startedAt;
    return startedAt ? format(new Date(startedAt), 'HH:mm') : '';
  });
  protected readonly elsewhereText = computed(() => {
    const name = this.active()?.deviceName;
    return `Running on another device${name ? ` (${name})` : ''} since ${this.since()}`;
  });
  protected readonly last = computed(() => this.data().last);
  protected readonly lastBook = computed(() => this.data().lastBook);
  protected readonly targets = TARGETS;
  protected readonly minutesWords = minutesWords;

  constructor() {
    inject(UnsavedWork).track(this.stopFormOpen);
    // Hold the screen lock only while a timer is active, whoever stopped it.
    effect(() => void this.awake.follow(this.active() !== null && !this.elsewhere()));
  }

  protected pause(): Promise<void> {
    return this.timer.pause();
  }

  protected resume(): Promise<void> {
    return this.timer.resume();
  }

  protected setTarget(value: string): Promise<void> {
    return this.timer.setTarget(value ? Number(value) : null);
  }

  protected setNotify(on: boolean): Promise<void> {
    return this.reminders.setNotify(on);
  }

  protected keepAwake(on: boolean): Promise<void> {
    return this.awake.setWanted(on);
  }

  protected captureQuote(): void {
    const bookId = this.active()?.bookId ?? undefined;
    const position = this.position();
    // Only a page is a page: an ebook's percent or an audiobook's minute is not.
    const page = positionUnit(this.book()) === 'page' && position != null ? Math.round(position) : undefined;
    this.quotes.open({ bookId, page });
  }

  /** Stops into a session (saved at once), then asks where the reader got to. */
  protected async stop(): Promise<void> {
    this.stopFormOpen.set(true);
    try {
      const sessionId = await this.timer.stop();
      await this.awake.follow(false);
      if (!sessionId) return;
      const ref = this.dialog.open<StopDialog, StopDialogData, boolean>(StopDialog, {
        data: { sessionId },
        width: '480px',
        maxWidth: '95vw',
        autoFocus: 'first-tabbable',
      });
      await firstValueFrom(ref.afterClosed());
    } finally {
      this.stopFormOpen.set(false);
    }
  }

  protected async discard(): Promise<void> {
    const data: ConfirmDialogData = {
      title: 'Discard this timer?',
      message: `The time on it (${minutesWords(this.timer.elapsedMs() / 60_000)}) will not be kept as a session.`,
      yes: 'Discard',
      no: 'Keep it',
    };
    const ref = this.dialog.open<ConfirmDialog, ConfirmDialogData, boolean>(ConfirmDialog, { data, width: '400px' });
    if (await firstValueFrom(ref.afterClosed())) await this.timer.discard();
  }
}
