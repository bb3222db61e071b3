import { ChangeDetectionStrategy, Component, computed, inject, input } from '@angular/core';
import { toObservable, toSignal } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { RouterLink } from '@angular/router';
import { liveQuery } from 'dexie';
import { combineLatest, from, of, switchMap } from 'rxjs';

import type { Book } from '@shared/sync/schema/collections';

import { BookCover } from '../../../core/covers/book-cover/book-cover';
import { LocalJournal } from '../../../core/data/local-journal';
import { authorLine, FORMAT_LABELS, STATUS_LABELS } from '../book-labels';

/** Everything about one book, live from this device (edits from other devices appear as they sync). */
@Component({
  selector: 'll-book-page',
  imports: [RouterLink, MatButtonModule, MatIconModule, BookCover],
  templateUrl: './book-page.html',
  styleUrl: './book-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class BookPage {
  /** The book's id, from the route. */
  readonly id = input.required<string>();

  private readonly journal = inject(LocalJournal);
  protected readonly book = toSignal(
    combineLatest([toObservable(this.journal.db), toObservable(this.id)]).pipe(
      switchMap(([db, id]) => (db ? from(liveQuery(async () => (await db.rows('books').get(id)) as Book | undefined)) : of(undefined))),
    ),
  );
  protected readonly authors = computed(() => authorLine(this.book()?.authors));
  protected readonly formatLabels = FORMAT_LABELS;
  protected readonly statusLabels = STATUS_LABELS;
}
