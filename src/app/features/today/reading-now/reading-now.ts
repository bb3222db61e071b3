import { ChangeDetectionStrategy, Component, computed } from '@angular/core';
import { RouterLink } from '@angular/router';

import type { Book } from '@shared/sync/schema/collections';

import { liveQuerySignal } from '../../../core/data/live-query';
import { authorLine } from '../../library/book-labels';
import { TimerStartButton } from '../../timer/timer-start-button/timer-start-button';

/** At most this many books, most recently started first. */
const SHOWN = 5;

/** The books being read now, each with a start button for the reading timer. */
@Component({
  selector: 'll-reading-now',
  imports: [RouterLink, TimerStartButton],
  template: `
    <section aria-labelledby="reading-now-heading">
      <h2 id="reading-now-heading">Reading now</h2>
      @if (books().length) {
        <ul class="books">
          @for (book of books(); track book.id) {
            <li>
              <span class="book">
                <a class="title" [routerLink]="['/library', book.id]">{{ book.title || 'Untitled' }}</a>
                <span class="authors">{{ authorLine(book.authors) }}</span>
              </span>
              <ll-timer-start-button [bookId]="book.id" [title]="book.title" />
            </li>
          }
        </ul>
      } @else {
        <p class="quiet">Nothing marked as reading. Start the timer on any book in your <a routerLink="/library">library</a>.</p>
      }
    </section>
  `,
  styles: `
    .books {
      list-style: none;
      margin: 0;
      padding: 0;
      max-width: 640px;
    }
    li {
      display: flex;
      align-items: center;
      justify-content: space-between;
      gap: 12px;
      padding: 8px 0;
      border-bottom: 1px solid var(--mat-sys-outline-variant);
    }
    .book {
      display: flex;
      flex-direction: column;
      min-width: 0;
    }
    .title {
      font-weight: 700;
      color: inherit;
    }
    .authors,
    .quiet {
      color: var(--mat-sys-on-surface-variant);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ReadingNow {
  private readonly reading = liveQuerySignal(
    async (db) => ((await db.rows('books').where('status').equals('reading').toArray()) as Book[]).filter((book) => !book.deleted),
    [] as Book[],
  );
  protected readonly books = computed(() =>
    [...this.reading()].sort((a, b) => (b.statusChangedAt ?? '').localeCompare(a.statusChangedAt ?? '')).slice(0, SHOWN),
  );
  protected readonly authorLine = authorLine;
}
