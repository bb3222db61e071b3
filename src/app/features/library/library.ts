import { ChangeDetectionStrategy, Component } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { RouterLink } from '@angular/router';

import type { Book } from '@shared/sync/schema/collections';

import { BookCover } from '../../core/covers/book-cover/book-cover';
import { liveQuerySignal } from '../../core/data/live-query';
import { authorLine, FORMAT_LABELS, STATUS_LABELS } from './book-labels';

/** Every book the reader tracks: owned, borrowed, wanted and finished. Read from this device. */
@Component({
  selector: 'll-library',
  imports: [RouterLink, MatButtonModule, MatIconModule, BookCover],
  templateUrl: './library.html',
  styleUrl: './library.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Library {
  protected readonly books = liveQuerySignal(
    async (db) =>
      ((await db.rows('books').toArray()) as Book[])
        .filter((book) => !book.deleted)
        .sort((a, b) => (a.title ?? '').localeCompare(b.title ?? '')),
    [] as Book[],
  );
  protected readonly authorLine = authorLine;
  protected readonly formatLabels = FORMAT_LABELS;
  protected readonly statusLabels = STATUS_LABELS;
}
