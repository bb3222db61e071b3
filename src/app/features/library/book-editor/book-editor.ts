import { ChangeDetectionStrategy, Component, effect, inject, input, signal } from '@angular/core';
import { FormBuilder, ReactiveFormsModule, Validators, type AbstractControl } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { Router, RouterLink } from '@angular/router';
import { toSignal } from '@angular/core/rxjs-interop';
import { map } from 'rxjs';

import { normalizeIsbn } from '@shared/isbn/normalize-isbn';
import { BOOK_FORMATS, BOOK_STATUSES, type Book } from '@shared/sync/schema/collections';

import { CoverPicker } from '../../../core/covers/cover-picker/cover-picker';
import { InvalidFieldsError } from '../../../core/data/field-errors';
import { UnsavedWork } from '../../../core/pwa/unsaved-work';
import { JournalStore } from '../../../core/data/journal-store';
import { fieldError, showServerErrors } from '../../account/field-errors';
import { FORMAT_LABELS, STATUS_LABELS } from '../book-labels';
import { changedFields, EMPTY_BOOK_FORM, toFields, toFormValue, type BookFormValue } from './book-form-model';

const isbnValidator = (control: AbstractControl<string>) =>
  !control.value?.trim() || normalizeIsbn(control.value) ? null : { server: 'Enter a valid ISBN-10 or ISBN-13 (check the digits)' };

/** Add a book, or edit one. Saves to this device at once; sync takes it from there. */
@Component({
  selector: 'll-book-editor',
  imports: [ReactiveFormsModule, RouterLink, MatButtonModule, MatFormFieldModule, MatInputModule, MatSelectModule, CoverPicker],
  templateUrl: './book-editor.html',
  styleUrl: './book-editor.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class BookEditor {
  private readonly store = inject(JournalStore);
  private readonly router = inject(Router);

  /** The book's id from the route; absent when adding a new book. */
  readonly id = input<string>();

  protected readonly form = inject(FormBuilder).nonNullable.group({
    title: ['', [Validators.required, Validators.maxLength(500)]],
    authors: [''],
    format: EMPTY_BOOK_FORM.format as BookFormValue['format'],
    status: EMPTY_BOOK_FORM.status as BookFormValue['status'],
    rating: [''],
    pageCount: ['', [Validators.min(1), Validators.max(100_000), Validators.pattern(/^\d*$/)]],
    isbn: ['', isbnValidator],
    coverId: EMPTY_BOOK_FORM.coverId,
  });
  /** For the cover preview's placeholder. */
  protected readonly title = toSignal(this.form.controls.title.valueChanges, { initialValue: '' });
  protected readonly missing = signal(false);
  protected readonly problem = signal('');
  protected readonly formats = BOOK_FORMATS;
  protected readonly statuses = BOOK_STATUSES;
  protected readonly formatLabels = FORMAT_LABELS;
  protected readonly statusLabels = STATUS_LABELS;
  protected readonly ratings = [0.5, 1, 1.5, 2, 2.5, 3, 3.5, 4, 4.5, 5];
  protected readonly fieldError = fieldError;
  private original: BookFormValue = EMPTY_BOOK_FORM;

  constructor() {
    // An update or another tab must not reload the page over unsaved input.
    inject(UnsavedWork).track(toSignal(this.form.valueChanges.pipe(map(() => this.form.dirty)), { initialValue: false }));
    effect(() => {
      const id = this.id();
      if (id) void this.load(id);
    });
  }

  private async load(id: string): Promise<void> {
    const book = (await this.store.get('books', id)) as Book | undefined;
    if (!book || book.deleted) {
      this.missing.set(true);
      return;
    }
    this.original = toFormValue(book);
    this.form.reset(this.original);
  }

  protected async save(): Promise<void> {
    this.form.markAllAsTouched();
    if (this.form.invalid) return;
    const value = this.form.getRawValue();
    try {
      const id = this.id();
      if (id) {
        await this.store.write('books', id, changedFields(this.original, value));
      }
      const savedId = id ?? (await this.store.create('books', toFields(value)));
      this.form.markAsPristine();
      await this.router.navigate(['/library', savedId]);
    } catch (error) {
      if (error instanceof InvalidFieldsError) {
        showServerErrors(this.form, error.fields);
        this.problem.set('Some fields need attention.');
      } else {
        this.problem.set('This device could not save the book. Nothing you had saved before was changed.');
      }
    }
  }
}
