import { ChangeDetectionStrategy, Component, computed, effect, inject, signal } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { FormBuilder, ReactiveFormsModule, Validators, type AbstractControl, type ValidationErrors } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSlideToggleModule } from '@angular/material/slide-toggle';
import { map } from 'rxjs';

import type { Book, Quote } from '@shared/sync/schema/collections';

import { InvalidFieldsError } from '../../../core/data/field-errors';
import { JournalStore } from '../../../core/data/journal-store';
import { liveQuerySignal } from '../../../core/data/live-query';
import { UnsavedWork } from '../../../core/pwa/unsaved-work';
import { fieldError, notBlank, showServerErrors } from '../../../ui/field-errors';
import { TextField } from '../../../ui/text-field/text-field';
import { LabelPicker } from '../../../ui/label-picker/label-picker';
import { authorLine } from '../../../ui/book-labels';
import {
  changedQuoteFields,
  EMPTY_QUOTE_FORM,
  POSITION_LABELS,
  pageBeyondBook,
  positionError,
  tagsError,
  toQuoteFields,
  toQuoteForm,
  type PositionFormat,
  type QuoteFormValue,
} from '../quote-form-model';
import { booksToQuote } from '../quotes-data';

/** What the capture dialog opens with: a new quote's book and page, or a quote to edit. */
export interface QuoteCaptureData {
  readonly bookId?: string;
  readonly page?: number;
  readonly quote?: Quote;
}

/** Hints under the position field, per format. */
const POSITION_HINTS: Record<PositionFormat, string> = {
  print: 'The page it is on',
  ebook: 'A location such as 1234, or a percent such as 37%',
  audiobook: 'h:mm:ss such as 1:02:30, or minutes',
};

/** The reading-now books first (most recently started first), then the rest by title. */
function bookOrder(books: readonly Book[]): { reading: Book[]; others: Book[] } {
  const collator = new Intl.Collator(undefined, { sensitivity: 'base', numeric: true });
  const reading = books.filter((book) => book.status === 'reading').sort((a, b) => (b.statusChangedAt ?? '').localeCompare(a.statusChangedAt ?? ''));
  const others = books.filter((book) => book.status !== 'reading').sort((a, b) => collator.compare(a.title ?? '', b.title ?? ''));
  return { reading, others };
}

/**
 * Captures a quote, or edits one: the passage first, then where it is in the book (in the unit
 * of the book's format), and the optional rest. Saves to this device only.
 */
@Component({
  selector: 'll-quote-capture-dialog',
  imports: [ReactiveFormsModule, MatButtonModule, MatDialogModule, MatFormFieldModule, MatInputModule, MatSlideToggleModule, LabelPicker, TextField],
  templateUrl: './quote-capture-dialog.html',
  styleUrl: './quote-capture-dialog.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class QuoteCaptureDialog {
  private readonly store = inject(JournalStore);
  private readonly ref = inject<MatDialogRef<QuoteCaptureDialog, string>>(MatDialogRef);
  protected readonly data = inject<QuoteCaptureData>(MAT_DIALOG_DATA);

  private readonly books = liveQuerySignal(booksToQuote, undefined as Book[] | undefined);
  protected readonly choices = computed(() => bookOrder(this.books() ?? []));

  protected readonly form = inject(FormBuilder).nonNullable.group({
    text: ['', [Validators.required, notBlank, Validators.maxLength(5_000)]],
    bookId: [''],
    position: ['', (control: AbstractControl<string>) => this.checkPosition(control)],
    chapter: ['', Validators.maxLength(200)],
    note: ['', Validators.maxLength(5_000)],
    tags: ['', (control: AbstractControl<string>) => (tagsError(control.value ?? '') ? { server: tagsError(control.value) } : null)],
    favourite: [false],
  });
  protected readonly labelIds = signal<readonly string[]>([]);

  private readonly bookId = toSignal(this.form.controls.bookId.valueChanges, { initialValue: '' });
  /** The chosen book's format decides what the position means; no book counts pages. */
  protected readonly format = computed<PositionFormat>(() => this.books()?.find((book) => book.id === this.bookId())?.format ?? 'print');
  protected readonly positionLabel = computed(() => POSITION_LABELS[this.format()]);
  protected readonly positionHint = computed(() => POSITION_HINTS[this.format()]);
  protected readonly problem = signal('');
  /** A page past the book's end, said once; the next Save keeps it (editions differ). */
  protected readonly pageWarning = signal('');
  private confirmedPage = '';
  protected readonly editing = this.data.quote !== undefined;
  protected readonly fieldError = fieldError;
  protected readonly authorLine = authorLine;

  private original: QuoteFormValue = EMPTY_QUOTE_FORM;
  private originalFormat: PositionFormat = 'print';
  private saving = false;

  constructor() {
    const typed = toSignal(this.form.events.pipe(map(() => ({ dirty: this.form.dirty, text: this.form.controls.text.value }))), {
      initialValue: { dirty: false, text: '' },
    });
    const holdsWork = computed(() => {
      const { dirty, text } = typed();
      const labelsChanged = JSON.stringify(this.labelIds()) !== JSON.stringify(this.original.labelIds);
      return (dirty || labelsChanged) && text.trim() !== '';
    });
    // While it holds a passage, no update or other tab may reload over it, and a stray tap
    // outside (or Escape) does not close it; Cancel still does.
    inject(UnsavedWork).track(holdsWork);
    effect(() => (this.ref.disableClose = holdsWork()));
    effect(() => {
      this.format();
      this.form.controls.position.updateValueAndValidity();
    });
    this.fill();
  }

  private fill(): void {
    const quote = this.data.quote;
    if (quote) {
      // The format is known once the books are read; until then the stored unit shows.
      this.original = toQuoteForm(quote, 'print');
      this.form.reset(this.original);
      this.labelIds.set(this.original.labelIds);
      let known = false;
      effect(() => {
        if (known) return;
        const books = this.books();
        if (!books) return;
        known = true;
        this.originalFormat = books.find((book) => book.id === quote.bookId)?.format ?? 'print';
        this.original = toQuoteForm(quote, this.originalFormat);
        if (!this.form.dirty) this.form.controls.position.reset(this.original.position);
      });
      return;
    }
    this.form.reset({ ...EMPTY_QUOTE_FORM, bookId: this.data.bookId ?? '', position: this.data.page != null ? String(this.data.page) : '' });
    if (this.data.bookId) return;
    // Default to the book being read (the most recently started), once the books are read.
    let defaulted = false;
    effect(() => {
      if (defaulted) return;
      const books = this.books();
      if (!books) return;
      defaulted = true;
      if (!this.form.controls.bookId.dirty) this.form.controls.bookId.setValue(bookOrder(books).reading[0]?.id ?? '');
    });
  }

  private checkPosition(control: AbstractControl<string>): ValidationErrors | null {
    const problem = positionError(control.value ?? '', this.format?.() ?? 'print');
    return problem ? { server: problem } : null;
  }

  /** Ctrl+Enter (Cmd+Enter on a Mac) saves from anywhere in the dialog, the passage included. */
  protected onKeydown(event: KeyboardEvent): void {
    if (event.key === 'Enter' && (event.ctrlKey || event.metaKey)) {
      event.preventDefault();
      void this.save();
    }
  }

  /** Enter in the position field saves: the passage and the page are often all there is. */
  protected onPositionEnter(event: Event): void {
    event.preventDefault();
    void this.save();
  }

  protected async save(): Promise<void> {
    if (this.saving) return;
    this.form.markAllAsTouched();
    if (this.form.invalid) {
      this.problem.set('Some fields need attention.');
      return;
    }
    this.problem.set('');
    const value: QuoteFormValue = { ...this.form.getRawValue(), labelIds: this.labelIds() };
    const format = this.format();
    const book = this.books()?.find((candidate) => candidate.id === value.bookId);
    const warning = pageBeyondBook(value.position, format, book?.pageCount);
    if (warning && this.confirmedPage !== `${value.bookId}:${value.position.trim()}`) {
      this.confirmedPage = `${value.bookId}:${value.position.trim()}`;
      this.pageWarning.set(warning);
      return;
    }
    this.pageWarning.set('');
    this.saving = true;
    try {
      const quote = this.data.quote;
      let id: string;
      if (quote) {
        await this.store.write('quotes', quote.id, changedQuoteFields(this.original, this.originalFormat, value, format));
        id = quote.id;
      } else {
        id = await this.store.create('quotes', { ...toQuoteFields(value, format), capturedAt: new Date().toISOString() });
      }
      this.form.markAsPristine();
      this.ref.close(id);
    } catch (error) {
      if (error instanceof InvalidFieldsError) {
        const { page, ebookLocation, audioSeconds, ...rest } = error.fields;
        const position = page ?? ebookLocation ?? audioSeconds;
        showServerErrors(this.form, position ? { ...rest, position } : rest);
        this.problem.set('Some fields need attention.');
      } else {
        this.problem.set('This device could not save the quote. Nothing you had saved before was changed.');
      }
    } finally {
      this.saving = false;
    }
  }
}
