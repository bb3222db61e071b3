import { ChangeDetectionStrategy, Component, effect, inject, input, signal } from '@angular/core';
import { FormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { Router, RouterLink } from '@angular/router';

import { NOTEBOOK_LIMITS } from '@shared/journal/notebook-limits';

import { InvalidFieldsError } from '../../../core/data/field-errors';
import { liveQuerySignal } from '../../../core/data/live-query';
import { UnsavedWork } from '../../../core/pwa/unsaved-work';
import { notBlank, showServerErrors } from '../../../ui/field-errors';
import { RowChoiceField } from '../../../ui/row-choice-field/row-choice-field';
import { TextField } from '../../../ui/text-field/text-field';
import { bookChoices, notebookSummaries, type BookOption, type NotebookSummary } from '../notebook-data';
import { Notebooks } from '../notebooks';
import { PageTemplates } from '../page-templates/page-templates';
import { ReaderDatePipe } from '../../../ui/reader-date';

/** Every notebook the reader keeps, and a form to start one. */
@Component({
  selector: 'll-notebooks-page',
  imports: [ReaderDatePipe, ReactiveFormsModule, RouterLink, MatButtonModule, MatIconModule, PageTemplates, RowChoiceField, TextField],
  templateUrl: './notebooks-page.html',
  styleUrl: './notebooks-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class NotebooksPage {
  private readonly notebooksService = inject(Notebooks);
  private readonly router = inject(Router);

  /** A book to start the new notebook on, from `?book=` (the book page links here). */
  readonly book = input<string>();

  /** `null` until the first read from this device. */
  protected readonly notebooks = liveQuerySignal<NotebookSummary[] | null>(notebookSummaries, null);
  protected readonly books = liveQuerySignal<BookOption[]>(bookChoices, []);

  protected readonly form = inject(FormBuilder).nonNullable.group({
    title: ['', [Validators.required, notBlank, Validators.maxLength(NOTEBOOK_LIMITS.notebookTitle)]],
    bookId: [''],
  });
  protected readonly problem = signal('');

  constructor() {
    inject(UnsavedWork).trackForm(this.form);
    effect(() => {
      const book = this.book();
      if (book && !this.form.dirty) this.form.controls.bookId.setValue(book);
    });
  }

  protected async create(): Promise<void> {
    this.form.markAllAsTouched();
    // A blank title is as good as none.
    if (!this.form.controls.title.value.trim()) this.form.controls.title.setErrors({ required: true });
    if (this.form.invalid) {
      this.problem.set('Give the notebook a title first.');
      return;
    }
    const { title, bookId } = this.form.getRawValue();
    try {
      const id = await this.notebooksService.createNotebook(title, bookId || null);
      this.form.reset({ title: '', bookId: '' });
      this.problem.set('');
      await this.router.navigate(['/journal/notebooks', id]);
    } catch (error) {
      if (error instanceof InvalidFieldsError) showServerErrors(this.form, error.fields);
      this.problem.set('This device could not save the notebook.');
    }
  }
}
