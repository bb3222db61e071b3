import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { RouterLink } from '@angular/router';

import { localDay } from '@shared/calendar/local-day';

import { liveQuerySignal } from '../../../core/data/live-query';
import { CLOCK } from '../../../core/time/clock';
import { TIME_ZONE } from '../../../core/time/time-zone';
import { bookForecast, bookProgress } from '../../../core/read-model/book-forecast';
import { TimerStartButton } from '../../timer';
import { currentSessionsAndBooks, NO_SESSIONS } from '../today-data';
import { ReaderDatePipe } from '../../../ui/reader-date';

/** One book being read, as the list shows it. */
interface InProgressLine {
  readonly id: string;
  readonly title: string;
  /** Whole percent through the book; null when its length is not known. */
  readonly percent: number | null;
  readonly finishDate: string | null;
}

/** The books the reader is reading now, each with when they should finish it. */

@Component({
  selector: 'll-in-progress',
  imports: [ReaderDatePipe, RouterLink, TimerStartButton],
  templateUrl: './in-progress.html',
  styleUrl: './in-progress.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class InProgress {
  private readonly timeZone = inject(TIME_ZONE);
  private readonly clock = inject(CLOCK);

  private readonly data = liveQuerySignal(currentSessionsAndBooks, NO_SESSIONS);
  /** The journal has answered (Today shows its panels together, so none pushes another down). */
  readonly loaded = computed(() => this.data() !== NO_SESSIONS);

  protected readonly lines = computed<InProgressLine[]>(() => {
    const { sessions, books } = this.data();
    const today = localDay(new Date(this.clock.now()).toISOString(), this.timeZone);
    return books
      .filter((book) => book.status === 'reading')
      .sort((a, b) => (a.title ?? '').localeCompare(b.title ?? ''))
      .map((book) => {
        const fraction = bookProgress(
          book,
          sessions.filter((s) => s.bookId === book.id),
        ).fraction;
        return {
          id: book.id,
          title: book.title || 'Untitled',
          percent: fraction === null ? null : Math.round(fraction * 100),
          finishDate: bookForecast(book, sessions, books, today, this.timeZone)?.finishDate ?? null,
        };
      });
  });
}
