import { ChangeDetectionStrategy, Component, computed, effect, inject, input, signal, viewChildren } from '@angular/core';
import { FormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { Router, RouterLink } from '@angular/router';
import { format } from 'date-fns';

import { RECOMMEND_ANSWERS } from '@shared/sync/schema/collections';

import { InvalidFieldsError } from '../../../core/data/field-errors';
import { JournalStore, type RowWrite } from '../../../core/data/journal-store';
import { UnsavedWork } from '../../../core/pwa/unsaved-work';
import { MergeableTextarea, type PendingEdits } from '../../../core/text/mergeable-textarea';
import { LEAVE_WITHOUT_ASKING } from '../../../core/pwa/unsaved-work-guard';
import { fieldError, showServerErrors } from '../../../ui/field-errors';
import { TextField } from '../../../ui/text-field/text-field';
import { RECOMMEND_LABELS } from '../../../ui/book-labels';
import { changedReadingFields, EMPTY_READING_FORM, readingDatesValidator, toReadingFields, toReadingForm, type ReadingFormValue } from './reading-form-model';
import { ChoiceField, RATING_CHOICES, RATING_WORDS } from '../../../ui/choice-field/choice-field';

/** One reading of a book: its dates and the review. A re-read is simply another reading. */
@Component({
  selector: 'll-reading-editor',
  imports: [ChoiceField, ReactiveFormsModule, RouterLink, MatButtonModule, MatFormFieldModule, MatInputModule, MergeableTextarea, TextField],
  templateUrl: './reading-editor.html',
  styleUrl: './reading-editor.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ReadingEditor {
  private readonly store = inject(JournalStore);
  private readonly router = inject(Router);

  /** The book, from the route. */
  readonly id = input.required<string>();
  /** The reading, from the route; absent for a new one. */
  readonly readingId = input<string>();

  protected readonly form = inject(FormBuilder).nonNullable.group(
    {
      startedOn: [''],
      finishedOn: [''],
      rating: [''],
      summary: ['', Validators.maxLength(200)],
      review: ['', Validators.maxLength(20_000)],
      takeaways: ['', Validators.maxLength(5_000)],
      recommend: EMPTY_READING_FORM.recommend as ReadingFormValue['recommend'],
      recommendTo: ['', Validators.maxLength(200)],
    },
    { validators: readingDatesValidator(() => format(new Date(), 'yyyy-MM-dd')) },
  );
  protected readonly bookTitle = signal('');
  protected readonly problem = signal('');
  protected readonly ratings = RATING_CHOICES;
  protected readonly ratingWords = RATING_WORDS;
  protected readonly answers = RECOMMEND_ANSWERS;
  protected readonly answerLabels = RECOMMEND_LABELS;
  protected readonly fieldError = fieldError;
  /** Cancel discards on purpose, so it leaves without asking. */
  protected readonly leaveWithoutAsking = LEAVE_WITHOUT_ASKING;
  private original: ReadingFormValue = EMPTY_READING_FORM;
  /** A new reading's id, made now so its review can be edited as a Yjs text before it is saved. */
  private readonly newId = crypto.randomUUID();
  protected readonly rowId = computed(() => this.readingId() ?? this.newId);
  /** The review and takeaways, bound to their Yjs texts. */
  private readonly texts = viewChildren(MergeableTextarea);

  constructor() {
    inject(UnsavedWork).trackForm(this.form);
    effect(() => void this.load(this.id(), this.readingId()));
  }

  private async load(bookId: string, readingId: string | undefined): Promise<void> {
    const book = await this.store.get('books', bookId);
    this.bookTitle.set(book?.title ?? '');
    if (!readingId) {
      this.form.reset({ ...EMPTY_READING_FORM, startedOn: format(new Date(), 'yyyy-MM-dd') });
      this.original = EMPTY_READING_FORM;
      return;
    }
    const reading = await this.store.get('readings', readingId);
    if (reading) {
      this.original = toReadingForm(reading);
      this.form.reset(this.original);
    }
  }

  protected async save(): Promise<void> {
    this.form.markAllAsTouched();
    if (this.form.invalid) {
      this.problem.set(this.form.errors?.['dates'] ?? 'Some fields need attention.');
      return;
    }
    const bookId = this.id();
    const existing = this.readingId();
    const readingId = this.rowId();
    const value = this.form.getRawValue();
    const {
      review: _review,
      takeaways: _takeaways,
      ...patch
    }: Record<string, unknown> = existing ? changedReadingFields(this.original, value) : { ...toReadingFields(value), bookId, deleted: false };
    try {
      // The review and takeaways are saved as the edits typed here, which merge with other devices'
      // (typed before the stored text arrived, they are edits only once it has).
      await Promise.all(this.texts().map((text) => text.whenLoaded()));
      const typed = this.texts()
        .map((text) => [text, text.pendingEdits()] as const)
        .filter((entry): entry is [MergeableTextarea, PendingEdits] => entry[1] !== null);
      for (const [text, edits] of typed) patch[text.llMergeableText().field] = edits.value;
      const writes: RowWrite[] = [{ collection: 'readings', rowId: readingId, patch }];
      if (patch['rating'] !== undefined && (await this.isLatest(bookId, readingId, value.startedOn))) {
        // The book's rating follows its latest reading.
        writes.push({ collection: 'books', rowId: bookId, patch: { rating: patch['rating'] as number | null } });
      }
      await this.store.writeAll(writes);
      for (const [text, edits] of typed) text.saved(edits);
      this.form.markAsPristine();
      await this.router.navigate(['/library', bookId]);
    } catch (error) {
      if (error instanceof InvalidFieldsError) showServerErrors(this.form, error.fields);
      this.problem.set('This reading could not be saved. What was saved before is unchanged.');
    }
  }

  private async isLatest(bookId: string, readingId: string, startedOn: string): Promise<boolean> {
    const others = (await this.store.list('readings')).filter((r) => r.bookId === bookId && r.id !== readingId);
    return others.every((other) => (other.startedOn ?? '') <= (startedOn || '9999'));
  }
}
