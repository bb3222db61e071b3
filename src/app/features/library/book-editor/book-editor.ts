import { ChangeDetectionStrategy, Component, computed, effect, inject, input, signal, viewChild } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { FormBuilder, ReactiveFormsModule, Validators, type AbstractControl } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatCheckboxModule } from '@angular/material/checkbox';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { Router, RouterLink } from '@angular/router';
import { map, startWith } from 'rxjs';

import { normalizeIsbn } from '@shared/isbn/normalize-isbn';
import { BOOK_COPIES, BOOK_FORMATS, BOOK_STATUSES, PROGRESS_UNITS, WISH_PRIORITIES, type Series } from '@shared/sync/schema/collections';

import { CoverPicker } from '../../../core/covers/cover-picker/cover-picker';
import { InvalidFieldsError } from '../../../core/data/field-errors';
import { JournalStore } from '../../../core/data/journal-store';
import { liveQuerySignal } from '../../../core/data/live-query';
import { UnsavedWork } from '../../../core/pwa/unsaved-work';
import { LEAVE_WITHOUT_ASKING } from '../../../core/pwa/unsaved-work-guard';
import { fieldError, notBlank, showServerErrors } from '../../../ui/field-errors';
import { TextField } from '../../../ui/text-field/text-field';
import { LabelPicker } from '../../../ui/label-picker/label-picker';
import { COPY_LABELS, FORMAT_LABELS, STATUS_LABELS, WISH_PRIORITY_LABELS } from '../../../ui/book-labels';
import { BookStatus } from '../../../core/read-model/book-status';
import { CatalogueFill, CatalogueSearch, FILLABLE_FIELDS, PendingLookups, type FillInResult, type FillValues } from '../../catalogue';
import { IsbnScanButton } from '../isbn-scanner/isbn-scan-button';
import { changedFields, EMPTY_BOOK_FORM, toFields, toFormValue, type BookFormValue } from './book-form-model';
import { seriesByName } from '../library-data';
import { ChoiceField, RATING_CHOICES, RATING_WORDS } from '../../../ui/choice-field/choice-field';

const isbnValidator = (control: AbstractControl<string>) =>
  !control.value?.trim() || normalizeIsbn(control.value) ? null : { server: 'Enter a valid ISBN-10 or ISBN-13 (check the digits)' };
const languageValidator = (control: AbstractControl<string>) =>
  !control.value?.trim() || /^[A-Za-z]{2,3}(-[A-Za-z0-9]{1,8})*$/.test(control.value.trim()) ? null : { server: 'Use a language tag such as en, fr or pt-BR' };
const optionalId = (value: string) => value.trim() || null;
/** Fields shown only where they apply (the DNF and wishlist parts). */
const DNF_FIELDS = ['dnfProgress', 'dnfUnit', 'dnfOn', 'dnfReason'] as const;
const WISH_FIELDS = ['wishPriority', 'wishWhere', 'wishPriceNote'] as const;
const whole = (min: number, max: number) => [Validators.pattern(/^\s*\d*\s*$/), Validators.min(min), Validators.max(max)];

/** Add a book, or edit one. Saves to this device at once; sync takes it from there. */
@Component({
  selector: 'll-book-editor',
  imports: [
    ChoiceField,
    ReactiveFormsModule,
    RouterLink,
    MatButtonModule,
    MatCheckboxModule,
    MatFormFieldModule,
    MatIconModule,
    MatInputModule,
    LabelPicker,
    IsbnScanButton,
    CoverPicker,
    CatalogueFill,
    CatalogueSearch,
    TextField,
  ],
  templateUrl: './book-editor.html',
  styleUrl: './book-editor.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class BookEditor {
  private readonly store = inject(JournalStore);
  private readonly router = inject(Router);
  private readonly bookStatus = inject(BookStatus);
  private readonly pendingLookups = inject(PendingLookups);

  /** The book's id from the route; absent when adding a new book. */
  readonly id = input<string>();

  protected readonly form = inject(FormBuilder).nonNullable.group({
    title: ['', [Validators.required, notBlank, Validators.maxLength(500)]],
    subtitle: ['', Validators.maxLength(500)],
    authors: [''],
    format: EMPTY_BOOK_FORM.format as BookFormValue['format'],
    pageCount: ['', whole(1, 100_000)],
    audioMinutes: ['', whole(1, 20_000)],
    status: EMPTY_BOOK_FORM.status as BookFormValue['status'],
    copy: EMPTY_BOOK_FORM.copy as BookFormValue['copy'],
    rating: [''],
    isbn: ['', isbnValidator],
    publisher: ['', Validators.maxLength(200)],
    year: ['', whole(1, 3000)],
    language: ['', languageValidator],
    genres: [''],
    tags: [''],
    labelIds: [[] as string[]],
    seriesId: [''],
    seriesPosition: ['', [Validators.min(0), Validators.max(1000), Validators.pattern(/^\s*\d*([.,]\d+)?\s*$/)]],
    dnfProgress: ['', [Validators.min(0), Validators.max(100_000), Validators.pattern(/^\s*\d*([.,]\d+)?\s*$/)]],
    dnfUnit: EMPTY_BOOK_FORM.dnfUnit as BookFormValue['dnfUnit'],
    dnfOn: [''],
    dnfReason: ['', Validators.maxLength(1000)],
    wishPriority: EMPTY_BOOK_FORM.wishPriority as BookFormValue['wishPriority'],
    wishWhere: ['', Validators.maxLength(300)],
    wishPriceNote: ['', Validators.maxLength(200)],
    releaseDate: [''],
    preordered: [false],
    coverId: EMPTY_BOOK_FORM.coverId,
  });
  /** For the cover preview's placeholder. */
  protected readonly title = toSignal(this.form.controls.title.valueChanges, { initialValue: '' });
  private readonly format = toSignal(this.form.controls.format.valueChanges.pipe(startWith(this.form.controls.format.value)));
  private readonly status = toSignal(this.form.controls.status.valueChanges.pipe(startWith(this.form.controls.status.value)));
  private readonly copy = toSignal(this.form.controls.copy.valueChanges.pipe(startWith(this.form.controls.copy.value)));
  /** Audiobooks are measured in minutes, other formats in pages. */
  protected readonly audio = computed(() => this.format() === 'audiobook');
  /** The DNF and wishlist sections appear only where they apply. */
  protected readonly dnf = computed(() => this.status() === 'dnf');
  protected readonly wished = computed(() => this.copy() === 'wishlist');
  protected readonly allSeries = liveQuerySignal(seriesByName, [] as Series[]);
  protected readonly progressUnits = PROGRESS_UNITS;
  protected readonly progressUnitLabels = { page: 'Page', percent: 'Percent', minute: 'Minute' } as const;
  protected readonly priorities = WISH_PRIORITIES;
  protected readonly priorityLabels = WISH_PRIORITY_LABELS;
  protected readonly missing = signal(false);
  protected readonly problem = signal('');
  protected readonly formats = BOOK_FORMATS;
  protected readonly statuses = BOOK_STATUSES;
  protected readonly copies = BOOK_COPIES;
  protected readonly formatLabels = FORMAT_LABELS;
  protected readonly statusLabels = STATUS_LABELS;
  protected readonly copyLabels = COPY_LABELS;
  protected readonly ratings = RATING_CHOICES;
  protected readonly ratingWords = RATING_WORDS;
  protected readonly fieldError = fieldError;
  /** Cancel discards on purpose, so it leaves without asking. */
  protected readonly leaveWithoutAsking = LEAVE_WITHOUT_ASKING;
  private original: BookFormValue = EMPTY_BOOK_FORM;
  /** What the catalogue may fill, as the form holds it now (hidden fields included). */
  protected readonly fillable = toSignal(
    this.form.valueChanges.pipe(
      startWith(null),
      map(() => this.fillableNow()),
    ),
    { requireSync: true },
  );
  private readonly catalogueFill = viewChild(CatalogueFill);
  /** An ISBN the catalogue could not be asked about (offline): its book page asks later. */
  protected queuedIsbn: string | null = null;

  constructor() {
    // An update or another tab must not reload the page over unsaved input.
    inject(UnsavedWork).trackForm(this.form);
    // A hidden field is disabled: it cannot stop a save with a reason the reader cannot see, and
    // what it holds is not saved (see `save`).
    effect(() => this.enableWhatApplies());
    effect(() => {
      const id = this.id();
      if (id) void this.load(id);
    });
  }

  private async load(id: string): Promise<void> {
    const book = await this.store.get('books', id);
    if (!book || book.deleted) {
      this.missing.set(true);
      return;
    }
    this.original = toFormValue(book);
    this.form.reset(this.original);
  }

  private enableWhatApplies(): void {
    this.applies(['audioMinutes'], this.audio());
    this.applies(['pageCount'], !this.audio());
    this.applies(DNF_FIELDS, this.dnf());
    this.applies(WISH_FIELDS, this.wished());
  }

  private applies(names: readonly (keyof BookFormValue)[], shown: boolean): void {
    for (const name of names) {
      const control = this.form.controls[name];
      if (shown) control.enable({ emitEvent: false });
      else control.disable({ emitEvent: false });
    }
  }

  /** A scanned ISBN fills the field as if typed (dirty first, so unsaved work is tracked), then asks the catalogue. */
  protected fillIsbn(isbn: string): void {
    this.form.controls.isbn.markAsDirty();
    this.form.controls.isbn.setValue(isbn);
    void this.catalogueFill()?.lookUp(isbn);
  }

  /** A new book's untouched default (format "Print") counts as empty: the reader did not choose it. */
  private fillableNow(): FillValues {
    const raw = this.form.getRawValue();
    const untouchedDefault = (field: (typeof FILLABLE_FIELDS)[number]) => !this.id() && this.form.controls[field].pristine && raw[field] === EMPTY_BOOK_FORM[field];
    return Object.fromEntries(FILLABLE_FIELDS.map((field) => [field, untouchedDefault(field) ? '' : raw[field]])) as FillValues;
  }

  /** The values the reader took from the catalogue, as if typed. */
  protected fillFromCatalogue(values: FillInResult): void {
    for (const field of FILLABLE_FIELDS) {
      const value = values[field];
      if (value === undefined) continue;
      const control = this.form.controls[field] as AbstractControl<string>;
      control.setValue(value);
      control.markAsDirty();
      control.markAsTouched();
    }
  }

  protected async save(): Promise<void> {
    this.enableWhatApplies(); // now, not at the next change detection
    this.form.markAllAsTouched();
    if (this.form.invalid) {
      this.problem.set('Some fields need attention.');
      return;
    }
    // Hidden (disabled) fields keep what was loaded, or stay empty on a new book.
    const value: BookFormValue = { ...this.original, ...this.form.value };
    const existing = this.id();
    const bookId = existing ?? crypto.randomUUID();
    const patch: Record<string, unknown> = existing ? changedFields(this.original, value) : { ...toFields(value), deleted: false };
    const statusChanged = !existing || patch['status'] !== undefined;
    try {
      // A status change goes the way of the library's quick change: the same rows, in one write
      // with the other fields, then the same follow-up (the next book of a series).
      await this.store.writeAll(statusChanged ? this.bookStatus.writes(bookId, value.status, new Date(), patch) : [{ collection: 'books', rowId: bookId, patch }]);
    } catch (error) {
      if (error instanceof InvalidFieldsError) {
        showServerErrors(this.form, error.fields);
        this.problem.set('Some fields need attention.');
      } else {
        this.problem.set('This device could not save the book. Nothing you had saved before was changed.');
      }
      return;
    }
    if (this.queuedIsbn && normalizeIsbn(value.isbn) === this.queuedIsbn) this.pendingLookups.add(bookId, this.queuedIsbn);
    this.form.markAsPristine();
    await this.router.navigate(['/library', bookId]);
    if (statusChanged) await this.bookStatus.afterChange(bookId, value.status, optionalId(value.seriesId));
  }
}
