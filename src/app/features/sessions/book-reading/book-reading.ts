import { ChangeDetectionStrategy, Component, computed, inject, input } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { RouterLink } from '@angular/router';

import { localDay } from '@shared/calendar/local-day';
import type { Book, Session } from '@shared/sync/schema/collections';

import { JournalStore } from '../../../core/data/journal-store';
import { liveQuerySignal } from '../../../core/data/live-query';
import { CLOCK } from '../../../core/time/clock';
import { TIME_ZONE } from '../../../core/time/time-zone';
import { bookForecast, bookProgress } from '../../../core/read-model/book-forecast';
import { bookEnd, minutesLine, MOOD_LABELS, positionLine, progressLine } from '../book-position';
import { latestPosition, newestFirst } from '../../../core/read-model/reading-sessions';
import { undoableDelete } from '../../../ui/undoable-delete';
import { ReaderDatePipe } from '../../../ui/reader-date';
import { ReaderSettings } from '../../../core/settings/reader-settings';
import { NO_SESSIONS_OR_BOOKS, sessionsAndBooks } from '../sessions-data';

/** One line of the session list. */
interface SessionLine {
  readonly id: string;
  readonly when: string;
  readonly minutes: string;
  readonly span: string;
  readonly mood: string;
  readonly timer: boolean;
}

/**
 * A book's reading: how far the reader is (in the book's own unit), the time left and when they
 * should finish, and its sessions with edit and delete. Reads everything it needs itself.
 */
@Component({
  selector: 'll-book-reading',
  imports: [ReaderDatePipe, RouterLink, MatButtonModule, MatIconModule, MatProgressBarModule],
  templateUrl: './book-reading.html',
  styleUrl: './book-reading.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class BookReading {
  /** The book whose reading this is. */
  readonly book = input.required<Book>();

  private readonly store = inject(JournalStore);
  private readonly deleteWithUndo = undoableDelete();
  private readonly timeZone = inject(TIME_ZONE);
  private readonly clock = inject(CLOCK);
  private readonly dates = inject(ReaderSettings);

  private readonly data = liveQuerySignal(sessionsAndBooks, NO_SESSIONS_OR_BOOKS);
  private readonly allSessions = computed(() => this.data().sessions);

  private readonly sessions = computed(() => newestFirst(this.allSessions().filter((s) => s.bookId === this.book().id)));
  /** No session says where the reader got to yet: a length and a time to read, not a 0 % bar. */
  protected readonly notStarted = computed(() => latestPosition(this.sessions()) === undefined);
  protected readonly length = computed(() => {
    const end = bookEnd(this.book());
    if (end === null) return null;
    const format = this.book().format;
    return format === 'ebook' ? null : format === 'audiobook' ? `${minutesLine(end)} long` : `${end} pages`;
  });
  protected readonly progress = computed(() => {
    const { position, end, fraction } = bookProgress(this.book(), this.sessions());
    if (end === null || fraction === null) return null;
    return { line: progressLine(position, end, this.book().format), percent: Math.round(fraction * 100) };
  });
  protected readonly forecast = computed(() => {
    const book = this.book();
    if (book.status === 'finished' || book.status === 'dnf') return null;
    const today = localDay(new Date(this.clock.now()).toISOString(), this.timeZone);
    const forecast = bookForecast(book, this.allSessions(), this.data().books, today, this.timeZone);
    if (!forecast || forecast.minutesLeft === 0) return null;
    return { ...forecast, timeLeft: minutesLine(forecast.minutesLeft) };
  });
  protected readonly lines = computed<SessionLine[]>(() =>
    this.sessions().map((session) => ({
      id: session.id,
      when: session.startedAt ? this.dates.format(session.startedAt, 'dayTime') : 'Some time',
      minutes: session.activeMinutes == null ? '' : minutesLine(session.activeMinutes),
      span: this.span(session),
      mood: session.mood ? MOOD_LABELS[session.mood] : '',
      timer: session.source === 'timer',
    })),
  );

  private span(session: Session): string {
    const format = session.format ?? this.book().format;
    const { fromPosition: from, toPosition: to } = session;
    if (from != null && to != null) return `${positionLine(from, format)} → ${positionLine(to, format)}`;
    if (to != null) return `to ${positionLine(to, format)}`;
    return '';
  }

  protected async remove(line: SessionLine): Promise<void> {
    await this.deleteWithUndo('sessions', line.id, 'Session deleted.');
  }
}
