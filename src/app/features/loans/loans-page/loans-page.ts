import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { FormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { RouterLink } from '@angular/router';

import { byUrgency } from '@shared/loans/urgency';
import { LOAN_KINDS } from '@shared/sync/schema/collections';

import { JournalStore } from '../../../core/data/journal-store';
import { readerToday } from '../../../core/time/reader-today';
import { fieldError } from '../../../ui/field-errors';
import { RowChoiceField } from '../../../ui/row-choice-field/row-choice-field';
import { TextField } from '../../../ui/text-field/text-field';
import { LoanItem } from '../loan-item/loan-item';
import { loansData } from '../loans-data';
import { loanView } from '../loan-view';

const KIND_LABELS: Record<(typeof LOAN_KINDS)[number], string> = {
  library: 'Borrowed from a library',
  hold: 'A hold at a library',
  lentOut: 'Lent to a friend',
  borrowed: 'Borrowed from a friend',
};
const DATE = /^\d{4}-\d{2}-\d{2}$/;

/** Every loan, hold and lending, what needs doing soonest first; a form to add one; the reader's libraries. */
@Component({
  selector: 'll-loans-page',
  imports: [ReactiveFormsModule, RouterLink, MatButtonModule, MatFormFieldModule, MatInputModule, LoanItem, RowChoiceField, TextField],
  templateUrl: './loans-page.html',
  styleUrl: './loans-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LoansPage {
  private readonly store = inject(JournalStore);
  private readonly data = loansData();
  private readonly today = readerToday();

  protected readonly books = computed(() => [...this.data().books].sort((a, b) => (a.title ?? '').localeCompare(b.title ?? '')));
  protected readonly libraries = computed(() => this.data().libraries);
  protected readonly libraryById = computed(() => new Map(this.data().libraries.map((l) => [l.id, l])));
  private readonly views = computed(() => {
    const books = new Map(this.data().books.map((b) => [b.id, b]));
    return byUrgency(this.data().loans, this.today).map((loan) => loanView(loan, this.today, books, this.libraryById()));
  });
  protected readonly open = computed(() => this.views().filter((v) => v.state !== 'closed'));
  protected readonly closed = computed(() =>
    this.views()
      .filter((v) => v.state === 'closed')
      .slice(0, 20),
  );

  protected readonly kinds = LOAN_KINDS;
  protected readonly kindLabels = KIND_LABELS;
  protected readonly adding = signal(false);
  protected readonly problem = signal('');
  protected readonly fieldError = fieldError;
  protected readonly form = inject(FormBuilder).nonNullable.group({
    kind: 'library' as (typeof LOAN_KINDS)[number],
    bookId: [''],
    libraryId: [''],
    friendName: ['', Validators.maxLength(120)],
    startedOn: [this.today, Validators.pattern(DATE)],
    dueOn: ['', Validators.pattern(DATE)],
    renewalsAllowed: [null as number | null, [Validators.min(0), Validators.max(99)]],
    queuePosition: [null as number | null, [Validators.min(1), Validators.max(100_000)]],
  });
  protected readonly libraryForm = inject(FormBuilder).nonNullable.group({
    name: ['', [Validators.required, Validators.maxLength(120)]],
    cardLabel: ['', Validators.maxLength(60)],
    loanDays: [null as number | null, [Validators.min(1), Validators.max(365)]],
  });

  protected async add(): Promise<void> {
    const value = this.form.getRawValue();
    this.form.markAllAsTouched();
    const friend = value.kind === 'lentOut' || value.kind === 'borrowed';
    const missing = !value.bookId ? 'Choose the book.' : friend && !value.friendName.trim() ? 'Name the friend.' : '';
    if (this.form.invalid || missing) {
      this.problem.set(missing || 'Some fields need attention.');
      return;
    }
    const library = this.libraryById().get(value.libraryId);
    await this.store.create('loans', {
      kind: value.kind,
      bookId: value.bookId,
      libraryId: friend ? null : value.libraryId || null,
      friendName: friend ? value.friendName.trim() : null,
      startedOn: value.startedOn || null,
      dueOn: value.kind === 'hold' ? null : value.dueOn || null,
      renewalsUsed: value.kind === 'library' ? 0 : null,
      renewalsAllowed: value.kind === 'library' ? (value.renewalsAllowed ?? library?.renewalsAllowed ?? null) : null,
      queuePosition: value.kind === 'hold' ? value.queuePosition : null,
    });
    this.problem.set('');
    this.adding.set(false);
    this.form.reset();
  }

  protected async addLibrary(): Promise<void> {
    this.libraryForm.markAllAsTouched();
    if (this.libraryForm.invalid) return;
    const { name, cardLabel, loanDays } = this.libraryForm.getRawValue();
    await this.store.create('libraries', { name: name.trim(), cardLabel: cardLabel.trim() || null, loanDays });
    this.libraryForm.reset();
  }

  protected removeLibrary(id: string): Promise<void> {
    return this.store.remove('libraries', id);
  }
}
