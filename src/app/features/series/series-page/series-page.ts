import { ChangeDetectionStrategy, Component, computed, effect, inject, input, signal } from '@angular/core';
import { FormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { Router, RouterLink } from '@angular/router';

import { nextUnread, seriesBooks, seriesProgress } from '@shared/journal/series-order';

import { JournalStore } from '../../../core/data/journal-store';
import { UnsavedWork } from '../../../core/pwa/unsaved-work';
import { fieldError, notBlank } from '../../../ui/field-errors';
import { TextField } from '../../../ui/text-field/text-field';
import { STATUS_LABELS } from '../../../ui/book-labels';
import { StarRating } from '../../../ui/star-rating/star-rating';
import { liveQueryFor } from '../../../core/data/live-query-for';
import { askToConfirm } from '../../../ui/confirm-dialog/ask-to-confirm';
import { undoableDelete } from '../../../ui/undoable-delete';
import { oneSeries } from '../series-data';
import { ChoiceField, RATING_CHOICES, RATING_WORDS } from '../../../ui/choice-field/choice-field';

/** One series: its books in order, progress, the next to read, and the reader's view of it all. */
@Component({
  selector: 'll-series-page',
  imports: [ChoiceField, ReactiveFormsModule, RouterLink, MatButtonModule, MatFormFieldModule, MatInputModule, MatProgressBarModule, StarRating, TextField],
  templateUrl: './series-page.html',
  styleUrl: './series-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SeriesPage {
  /** The series id, from the route. */
  readonly id = input.required<string>();

  private readonly store = inject(JournalStore);
  private readonly router = inject(Router);
  private readonly confirm = askToConfirm();
  private readonly deleteWithUndo = undoableDelete();
  private readonly data = liveQueryFor(this.id, oneSeries);
  protected readonly series = computed(() => this.data()?.series);
  protected readonly ordered = computed(() => seriesBooks(this.data()?.books ?? [], this.id()));
  protected readonly progress = computed(() => seriesProgress(this.ordered(), this.series()?.plannedCount));
  protected readonly next = computed(() => nextUnread(this.ordered()));
  protected readonly statusLabels = STATUS_LABELS;
  protected readonly ratings = RATING_CHOICES;
  protected readonly ratingWords = RATING_WORDS;
  protected readonly saved = signal(false);
  protected readonly fieldError = fieldError;

  protected readonly form = inject(FormBuilder).nonNullable.group({
    name: ['', [Validators.required, notBlank, Validators.maxLength(300)]],
    plannedCount: ['', [Validators.pattern(/^\s*\d*\s*$/), Validators.min(1), Validators.max(500)]],
    rating: [''],
    review: ['', Validators.maxLength(20_000)],
  });
  private original = this.form.getRawValue();

  constructor() {
    inject(UnsavedWork).trackForm(this.form);
    // Fill the form once per series; later live updates must not wipe what the reader is typing.
    let filledFor: string | null = null;
    effect(() => {
      const series = this.series();
      if (!series || filledFor === series.id) return;
      filledFor = series.id;
      this.original = {
        name: series.name ?? '',
        plannedCount: series.plannedCount == null ? '' : String(series.plannedCount),
        rating: series.rating == null ? '' : String(series.rating),
        review: series.review ?? '',
      };
      this.form.reset(this.original);
    });
  }

  protected async save(): Promise<void> {
    this.form.markAllAsTouched();
    if (this.form.invalid) return;
    const value = this.form.getRawValue();
    const fields = {
      name: value.name.trim(),
      plannedCount: value.plannedCount.trim() ? Number(value.plannedCount) : null,
      rating: value.rating ? Number(value.rating) : null,
      review: value.review.trim() || null,
    };
    const before = {
      name: this.original.name.trim(),
      plannedCount: this.original.plannedCount.trim() ? Number(this.original.plannedCount) : null,
      rating: this.original.rating ? Number(this.original.rating) : null,
      review: this.original.review.trim() || null,
    };
    const changed = Object.fromEntries(Object.entries(fields).filter(([key, v]) => v !== before[key as keyof typeof before]));
    await this.store.write('series', this.id(), changed);
    this.original = value;
    this.form.markAsPristine();
    this.saved.set(true);
  }

  /**
   * Its books stay in the library: while the series is deleted every screen reads their link to
   * it as no series, and restoring it from Trash links them again.
   */
  protected async deleteSeries(): Promise<void> {
    const series = this.series();
    if (!series) return;
    const count = this.ordered().length;
    const yes = await this.confirm({
      title: `Delete the series “${series.name}”?`,
      message: `${count === 1 ? 'Its book stays' : `Its ${count} books stay`} in your library, in no series. You can restore it from Trash (Settings) for 30 days.`,
      yes: 'Delete series',
      no: 'Keep it',
    });
    if (!yes) return;
    this.form.markAsPristine(); // the reader chose to delete it, unsaved edits and all
    await this.deleteWithUndo('series', series.id, `Series “${series.name}” deleted.`);
    await this.router.navigate(['/journal/series']);
  }
}
