import { ChangeDetectionStrategy, Component, computed, inject, input } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { Router, RouterLink } from '@angular/router';

import { BOOK_STATUSES, type Book, type Reading } from '@shared/sync/schema/collections';

import { BookCover } from '../../../core/covers/book-cover/book-cover';
import { OverwrittenNote } from '../../../core/sync/overwritten-note/overwritten-note';
import { CatalogueOffer } from '../../catalogue';
import { BookQuotes, QuoteCapture } from '../../quotes';
import { authorLine, COPY_LABELS, FORMAT_LABELS, lengthLine, RECOMMEND_LABELS, STATUS_LABELS, WISH_PRIORITY_LABELS } from '../../../ui/book-labels';
import { BookNotebooks } from '../../notebooks';
import { BookStatus } from '../../../core/read-model/book-status';
import { StarRating } from '../../../ui/star-rating/star-rating';
import { LabelChips } from '../../../ui/label-chips/label-chips';
import { BookReading } from '../../sessions';
import { BookLoansSection } from '../../loans';
import { TimerStartButton } from '../../timer';
import { liveQueryFor } from '../../../core/data/live-query-for';
import { Deletions } from '../../../core/trash/deletions';
import { askToConfirm } from '../../../ui/confirm-dialog/ask-to-confirm';
import { undoableDelete } from '../../../ui/undoable-delete';
import { companionLine } from '@shared/trash/companion-words';
import { ReaderDatePipe } from '../../../ui/reader-date';
import { bookDossier } from '../library-data';

/** One book: its details, its readings with reviews, and its status history, live from this device. */
@Component({
  selector: 'll-book-page',
  imports: [
    ReaderDatePipe,
    RouterLink,
    MatButtonModule,
    MatIconModule,
    StarRating,
    LabelChips,
    BookCover,
    BookQuotes,
    BookNotebooks,
    BookReading,
    BookLoansSection,
    TimerStartButton,
    CatalogueOffer,
    OverwrittenNote,
  ],
  templateUrl: './book-page.html',
  styleUrl: './book-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class BookPage {
  /** The book's id, from the route. */
  readonly id = input.required<string>();

  private readonly deletions = inject(Deletions);
  private readonly router = inject(Router);
  private readonly confirm = askToConfirm();
  private readonly deleteWithUndo = undoableDelete();
  private readonly bookStatus = inject(BookStatus);
  private readonly quoteCapture = inject(QuoteCapture);
  private readonly data = liveQueryFor(this.id, bookDossier);
  protected readonly book = computed(() => this.data()?.book);
  protected readonly readings = computed(() => this.data()?.readings ?? []);
  protected readonly history = computed(() => this.data()?.history ?? []);
  protected readonly series = computed(() => this.data()?.series);
  protected readonly loaded = computed(() => this.data() !== undefined);
  protected readonly authors = computed(() => authorLine(this.book()?.authors));
  protected readonly length = computed(() => (this.book() ? lengthLine(this.book()!) : ''));

  protected readonly statuses = BOOK_STATUSES;
  protected readonly formatLabels = FORMAT_LABELS;
  protected readonly statusLabels = STATUS_LABELS;
  protected readonly copyLabels = COPY_LABELS;
  protected readonly recommendLabels = RECOMMEND_LABELS;
  protected readonly priorityLabels = WISH_PRIORITY_LABELS;

  protected changeStatus(status: string): void {
    void this.bookStatus.change(this.id(), status as NonNullable<Book['status']>);
  }

  protected captureQuote(): void {
    void this.quoteCapture.open({ bookId: this.id() });
  }

  protected async deleteReading(reading: Reading): Promise<void> {
    await this.deleteWithUndo('readings', reading.id, 'Reading deleted.');
  }

  /** Asks first, saying what goes with the book; everything stays in Trash for 30 days. */
  protected async deleteBook(): Promise<void> {
    const book = this.book();
    if (!book) return;
    const companions = await this.deletions.companionsOf('books', book.id);
    const along = companionLine(companions.map(({ collection, ids }) => ({ collection, count: ids.length })));
    const yes = await this.confirm({
      title: `Delete “${book.title}”?`,
      message: `${along ? `Its ${along} go with it. ` : ''}You can restore it from Trash (Settings) for 30 days.`,
      yes: 'Delete book',
      no: 'Keep it',
    });
    if (!yes) return;
    await this.deleteWithUndo('books', book.id, `“${book.title}” deleted.`);
    await this.router.navigate(['/library']);
  }
}
