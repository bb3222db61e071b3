import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { FormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { RouterLink } from '@angular/router';

import { deterministicId } from '@shared/sync/deterministic-id';
import { FAVOURITE_KINDS, type Favourite, type MonthPick } from '@shared/sync/schema/collections';

import { JournalStore } from '../../../core/data/journal-store';
import { liveQuerySignal } from '../../../core/data/live-query';
import { fieldError } from '../../../ui/field-errors';
import { RowChoiceField } from '../../../ui/row-choice-field/row-choice-field';
import { TextField } from '../../../ui/text-field/text-field';
import { undoableDelete } from '../../../ui/undoable-delete';
import { readerToday } from '../../../core/time/reader-today';
import { ReaderDatePipe } from '../../../ui/reader-date';
import { favouritesAndSubjects, NO_FAVOURITES } from '../favourites-data';
import { ChoiceField } from '../../../ui/choice-field/choice-field';

const KIND_LABELS: Record<(typeof FAVOURITE_KINDS)[number], string> = { book: 'Book', author: 'Author', quote: 'Quote' };

/** Favourite books, authors and quotes, each with why; and a pick for each month of the year. */
@Component({
  selector: 'll-favourites-page',
  imports: [ChoiceField, ReaderDatePipe, ReactiveFormsModule, RouterLink, MatButtonModule, MatFormFieldModule, MatInputModule, RowChoiceField, TextField],
  templateUrl: './favourites-page.html',
  styleUrl: './favourites-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class FavouritesPage {
  private readonly store = inject(JournalStore);
  private readonly deleteWithUndo = undoableDelete();
  private readonly data = liveQuerySignal(favouritesAndSubjects, NO_FAVOURITES);
  protected readonly books = computed(() => [...this.data().books].sort((a, b) => (a.title ?? '').localeCompare(b.title ?? '')));
  protected readonly quotes = computed(() => this.data().quotes);
  /** A quote as the quote choice reads: its first 60 characters. */
  protected readonly quoteStart = (quote: { readonly text?: string | null }) => (quote.text ?? '').slice(0, 60);
  private readonly bookById = computed(() => new Map(this.data().books.map((b) => [b.id, b])));
  private readonly quoteById = computed(() => new Map(this.data().quotes.map((q) => [q.id, q])));
  protected readonly favourites = computed(() => this.data().favourites.map((favourite) => ({ favourite, subject: this.subject(favourite) })));

  /** The reader's local date (their time zone, the app's clock). */
  private readonly today = readerToday();
  /** The year whose months are shown. */
  protected readonly year = signal(Number(this.today.slice(0, 4)));
  protected readonly months = computed(() => {
    const picks = new Map(this.data().monthPicks.map((pick) => [pick.month, pick]));
    return Array.from({ length: 12 }, (_, n) => {
      const month = `${this.year()}-${String(n + 1).padStart(2, '0')}`;
      const pick = picks.get(month);
      return { month, first: `${month}-01`, pick, book: pick?.bookId ? this.bookById().get(pick.bookId) : undefined };
    });
  });
  protected readonly currentMonth = this.today.slice(0, 7);

  protected readonly kinds = FAVOURITE_KINDS;
  protected readonly kindLabels = KIND_LABELS;
  protected readonly adding = signal(false);
  protected readonly form = inject(FormBuilder).nonNullable.group({
    kind: 'book' as (typeof FAVOURITE_KINDS)[number],
    bookId: [''],
    quoteId: [''],
    authorName: ['', Validators.maxLength(200)],
    why: ['', Validators.maxLength(2_000)],
  });
  protected readonly problem = signal('');
  protected readonly fieldError = fieldError;

  private subject(favourite: Favourite): string {
    if (favourite.kind === 'author') return favourite.authorName ?? '';
    if (favourite.kind === 'quote') return `“${this.quoteById().get(favourite.quoteId ?? '')?.text ?? '…'}”`;
    return this.bookById().get(favourite.bookId ?? '')?.title ?? 'A book not on this device yet';
  }

  protected async addFavourite(): Promise<void> {
    const { kind, bookId, quoteId, authorName, why } = this.form.getRawValue();
    const missing = kind === 'book' ? !bookId : kind === 'quote' ? !quoteId : !authorName.trim();
    // Touched, so each field's own reason shows under it (a why that is too long, say).
    this.form.markAllAsTouched();
    if (this.form.invalid || missing) {
      this.problem.set(missing ? `Choose the ${kind} you love.` : 'Some fields need attention.');
      return;
    }
    await this.store.create('favourites', {
      kind,
      bookId: kind === 'book' ? bookId : null,
      quoteId: kind === 'quote' ? quoteId : null,
      authorName: kind === 'author' ? authorName.trim() : null,
      why: why.trim() || null,
    });
    this.problem.set('');
    this.adding.set(false);
    this.form.reset();
  }

  protected removeFavourite(favourite: Favourite): Promise<void> {
    return this.deleteWithUndo('favourites', favourite.id, 'Favourite removed.');
  }

  /** Deletes the month's pick; choosing a book for the month again brings the row back. */
  protected removePick(pick: MonthPick): Promise<void> {
    return this.deleteWithUndo('monthPicks', pick.id, 'Pick removed.');
  }

  /** One row per month, the same on every device (a name-based id), so picks never double up. */
  protected pickForMonth(month: string, bookId: string): Promise<void> {
    return this.store.write('monthPicks', deterministicId('month-pick', month), { month, bookId: bookId || null, deleted: false });
  }

  protected explainPick(month: string, why: string): Promise<void> {
    return this.store.write('monthPicks', deterministicId('month-pick', month), { month, why: why.trim() || null, deleted: false });
  }
}
