import { ChangeDetectionStrategy, Component, computed, inject, input } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { MatSnackBar } from '@angular/material/snack-bar';
import { RouterLink } from '@angular/router';

import { quotePosition, quoteWithSource } from '@shared/journal/quote-source';
import type { Book, Quote } from '@shared/sync/schema/collections';

import { JournalStore } from '../../../core/data/journal-store';
import { LabelChips } from '../../../ui/label-chips/label-chips';
import { authorLine } from '../../../ui/book-labels';
import { QuoteCapture } from '../quote-capture';
import { undoableDelete } from '../../../ui/undoable-delete';
import { ReaderDatePipe } from '../../../ui/reader-date';

/** One quote with where it is from, and what can be done with it: favourite, copy, edit, delete. */
@Component({
  selector: 'll-quote-card',
  imports: [ReaderDatePipe, RouterLink, MatButtonModule, MatIconModule, LabelChips],
  templateUrl: './quote-card.html',
  styleUrl: './quote-card.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class QuoteCard {
  private readonly store = inject(JournalStore);
  private readonly capture = inject(QuoteCapture);
  private readonly snackBar = inject(MatSnackBar);
  private readonly deleteWithUndo = undoableDelete();

  /** The quote to show. */
  readonly quote = input.required<Quote>();
  /** Its book, when it has one on this device. */
  readonly book = input<Book | undefined>();
  /** Show the book's title and author (not on the book's own page). */
  readonly showBook = input(true);

  protected readonly authors = computed(() => authorLine(this.book()?.authors));
  protected readonly position = computed(() => quotePosition(this.quote(), this.book()?.format));

  protected toggleFavourite(): Promise<void> {
    return this.store.write('quotes', this.quote().id, { favourite: !this.quote().favourite });
  }

  protected async copy(): Promise<void> {
    try {
      await navigator.clipboard.writeText(quoteWithSource(this.quote(), this.book()));
      this.snackBar.open('Copied, with its source line.', undefined, { duration: 3000 });
    } catch {
      this.snackBar.open('This browser did not allow copying. Select the passage to copy it by hand.', 'OK', { duration: 8000 });
    }
  }

  protected edit(): void {
    void this.capture.edit(this.quote());
  }

  /** A tombstone, like every delete; Undo simply lifts it. */
  protected async remove(): Promise<void> {
    const id = this.quote().id;
    await this.deleteWithUndo('quotes', id, 'Quote deleted.');
  }
}
