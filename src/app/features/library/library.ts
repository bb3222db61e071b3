import { ChangeDetectionStrategy, Component, computed, ElementRef, inject, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatPaginatorModule, type PageEvent } from '@angular/material/paginator';
import { MatSortModule, type Sort } from '@angular/material/sort';
import { MatTableModule } from '@angular/material/table';
import { RouterLink } from '@angular/router';

import { BOOK_STATUSES, type Book, type Session } from '@shared/sync/schema/collections';

import { BookCover } from '../../core/covers/book-cover/book-cover';
import { liveQuerySignal } from '../../core/data/live-query';
import { browserStorage } from '../../core/device/browser-storage';
import { authorLine, FORMAT_LABELS, STATUS_LABELS } from '../../ui/book-labels';
import { BookStatus } from '../../core/read-model/book-status';
import { duplicateBookCount, filterRows, LibraryRows, LibrarySorter, type LibraryQuery, type LibrarySortKey } from './library-query';
import { StarRating } from '../../ui/star-rating/star-rating';
import { LabelChips } from '../../ui/label-chips/label-chips';
import { LabelDirectory } from '../../core/read-model/label-directory';
import { TimerStartButton } from '../timer';
import { bookProgress } from '../../core/read-model/book-forecast';
import { shelfBooks, shelfSessions } from './library-data';

type View = 'table' | 'covers';
const VIEW_KEY = 'lamplight.libraryView';

/** Every book the reader tracks, as a table or a wall of covers. Read from this device only. */
@Component({
  selector: 'll-library',
  imports: [
    RouterLink,
    MatButtonModule,
    MatButtonToggleModule,
    MatFormFieldModule,
    MatIconModule,
    MatInputModule,
    MatPaginatorModule,
    MatSortModule,
    MatTableModule,
    StarRating,
    LabelChips,
    BookCover,
    TimerStartButton,
  ],
  templateUrl: './library.html',
  styleUrl: './library.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Library {
  private readonly bookStatus = inject(BookStatus);

  protected readonly books = liveQuerySignal(shelfBooks, [] as Book[]);
  /** Rows keyed by id: only books that changed get their search text and sort keys again. */
  private readonly derived = new LibraryRows();
  private readonly rows = computed(() => this.derived.update(this.books()));
  /** Every row in the chosen order; a keystroke only filters it, and a change re-sorts from the last order. */
  private readonly sorter = new LibrarySorter();
  private readonly sorted = computed(() => this.sorter.sort(this.rows(), this.sort()));
  /** Books that look entered twice (same ISBN-13, or title and first author), from keys kept per row. */
  protected readonly duplicates = computed(() => duplicateBookCount(this.rows()));

  protected readonly text = signal('');
  protected readonly status = signal<LibraryQuery['status']>('all');
  protected readonly labelId = signal<string | null>(null);
  protected readonly labels = inject(LabelDirectory).all;
  protected readonly sort = signal<LibraryQuery['sort']>({ by: 'title', direction: 'asc' });
  protected readonly view = signal<View>(browserStorage.read<View>(VIEW_KEY) ?? 'table');
  protected readonly page = signal({ index: 0, size: 50 });

  protected readonly found = computed(() => filterRows(this.sorted(), { text: this.text(), status: this.status(), labelId: this.labelId() }));
  protected readonly shown = computed(() => {
    const { index, size } = this.page();
    return this.found().slice(index * size, (index + 1) * size);
  });

  private readonly sessions = liveQuerySignal(shelfSessions, [] as Session[]);
  /** Percent read of each book being read or paused whose length is known (from its latest session). */
  protected readonly progress = computed(() => {
    const byBook = new Map<string, Session[]>();
    for (const session of this.sessions()) byBook.set(session.bookId ?? '', [...(byBook.get(session.bookId ?? '') ?? []), session]);
    const percents = new Map<string, number>();
    for (const book of this.books()) {
      if (book.status !== 'reading' && book.status !== 'paused') continue;
      const { fraction } = bookProgress(book, byBook.get(book.id) ?? []);
      if (fraction !== null) percents.set(book.id, Math.round(fraction * 100));
    }
    return percents;
  });

  protected readonly columns = ['cover', 'title', 'authors', 'format', 'status', 'progress', 'rating', 'timer'];
  protected readonly statuses = BOOK_STATUSES;
  protected readonly statusLabels = STATUS_LABELS;
  protected readonly authorLine = authorLine;

  /** Table rows follow books by id, so a changed book re-renders its row only. */
  protected readonly byId = (_index: number, book: Book) => book.id;

  protected formatOf(book: Book): string {
    return book.format ? FORMAT_LABELS[book.format] : '';
  }

  protected statusOf(book: Book): string {
    return book.status ? STATUS_LABELS[book.status] : '';
  }

  protected search(text: string): void {
    this.text.set(text);
    this.page.update((page) => ({ ...page, index: 0 }));
  }

  protected filterStatus(status: LibraryQuery['status']): void {
    this.status.set(status);
    this.page.update((page) => ({ ...page, index: 0 }));
  }

  protected filterLabel(labelId: string): void {
    this.labelId.set(labelId || null);
    this.page.update((page) => ({ ...page, index: 0 }));
  }

  protected sortBy(sort: Sort): void {
    this.sort.set({ by: (sort.active || 'title') as LibrarySortKey, direction: sort.direction || 'asc' });
  }

  protected turnPage(event: PageEvent): void {
    this.page.set({ index: event.pageIndex, size: event.pageSize });
  }

  protected show(view: View): void {
    this.view.set(view);
    browserStorage.write(VIEW_KEY, view);
  }

  constructor() {
    // A row's status is chosen through a listener Angular does not wrap: a template listener marks
    // the Library for change detection, and that frame ran before IndexedDB could answer the
    // write's reads (bench:write). Nothing on screen changes until the write is stored; the row
    // then follows from the books' live query.
    inject<ElementRef<HTMLElement>>(ElementRef).nativeElement.addEventListener('change', (event) => {
      const select = event.target;
      if (!(select instanceof HTMLSelectElement) || !select.classList.contains('quick-status') || !select.dataset['bookId']) return;
      void this.bookStatus.change(select.dataset['bookId'], select.value as NonNullable<Book['status']>);
    });
  }
}
