import { ChangeDetectionStrategy, Component, computed, inject, input, type OnInit, output, signal } from '@angular/core';
import { FormBuilder, ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';

import { changedLoanFields, LOAN_EDIT_FIELDS, type LoanEdit, type LoanEditField, loanEditProblems } from '@shared/loans/loan-edit';
import type { Library, Loan } from '@shared/sync/schema/collections';

import { InvalidFieldsError } from '../../../core/data/field-errors';
import { JournalStore } from '../../../core/data/journal-store';
import { fieldError } from '../../../ui/field-errors';

/** Each field's label, by the kind of loan where it reads differently. */
const LABELS: Readonly<Record<LoanEditField, string | ((kind: Loan['kind']) => string)>> = {
  libraryId: 'Library',
  friendName: (kind) => (kind === 'lentOut' ? 'Lent to' : 'Borrowed from'),
  startedOn: (kind) => (kind === 'hold' ? 'Placed on' : kind === 'lentOut' ? 'Lent on' : 'Borrowed on'),
  dueOn: (kind) => (kind === 'library' ? 'Due on' : 'Expected back'),
  renewalsUsed: 'Renewals used',
  renewalsAllowed: 'Renewals allowed',
  returnedOn: (kind) => (kind === 'lentOut' ? 'Back home on' : 'Returned on'),
  queuePosition: 'Place in the queue',
  readyOn: 'Ready on',
  pickUpBy: 'Pick up by',
};

function labelOf(field: LoanEditField, kind: Loan['kind']): string {
  const label = LABELS[field];
  return typeof label === 'string' ? label : label(kind);
}

const DATES: readonly LoanEditField[] = ['startedOn', 'dueOn', 'returnedOn', 'readyOn', 'pickUpBy'];
const NUMBERS: readonly LoanEditField[] = ['renewalsUsed', 'renewalsAllowed', 'queuePosition'];

/**
 * Edits a loan's, hold's or lending's own fields (the fields its kind has), written to this
 * device first. Bad values get the shared schema's reasons under the field, as the server would.
 */
@Component({
  selector: 'll-loan-editor',
  imports: [ReactiveFormsModule, MatButtonModule, MatFormFieldModule, MatInputModule],
  templateUrl: './loan-editor.html',
  styleUrl: './loan-editor.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LoanEditor implements OnInit {
  private readonly store = inject(JournalStore);
  readonly loan = input.required<Loan>();
  readonly libraries = input<readonly Library[]>([]);
  /** Saved or cancelled. */
  readonly done = output<void>();

  protected readonly fields = computed(() => LOAN_EDIT_FIELDS[this.loan().kind ?? 'library']);
  protected readonly label = (field: LoanEditField) => labelOf(field, this.loan().kind);
  protected readonly isDate = (field: LoanEditField) => DATES.includes(field);
  protected readonly isNumber = (field: LoanEditField) => NUMBERS.includes(field);
  protected readonly problem = signal('');
  protected readonly fieldError = fieldError;
  protected readonly form = inject(FormBuilder).group({
    libraryId: [''],
    friendName: [''],
    startedOn: [''],
    dueOn: [''],
    renewalsUsed: [null as number | null],
    renewalsAllowed: [null as number | null],
    returnedOn: [''],
    queuePosition: [null as number | null],
    readyOn: [''],
    pickUpBy: [''],
  });

  ngOnInit(): void {
    const loan = this.loan();
    this.form.reset(
      Object.fromEntries(
        Object.keys(this.form.controls).map((name) => [name, loan[name as LoanEditField] ?? (NUMBERS.includes(name as LoanEditField) ? null : '')]),
      ),
    );
  }

  /** The form's values for this kind's fields, blanks as none, names trimmed. */
  private edit(): LoanEdit {
    const value = this.form.getRawValue() as Record<LoanEditField, string | number | null>;
    const edit: Record<string, string | number | null> = {};
    for (const field of this.fields()) {
      const raw = value[field];
      edit[field] = typeof raw === 'string' ? raw.trim() || null : raw;
    }
    return edit as LoanEdit;
  }

  protected async save(): Promise<void> {
    const loan = this.loan();
    const edit = this.edit();
    const problems = loanEditProblems(loan, edit);
    this.showProblems(problems);
    if (Object.keys(problems).length > 0) return;
    try {
      const changes = changedLoanFields(loan, edit);
      if (Object.keys(changes).length > 0) await this.store.write('loans', loan.id, changes);
      this.problem.set('');
      this.done.emit();
    } catch (error) {
      if (error instanceof InvalidFieldsError) this.showProblems(error.fields);
      else this.problem.set('This could not be saved. What was saved before is unchanged.');
    }
  }

  /** Each reason under its field, with the field's name ("Place in the queue must be at least 1"). */
  private showProblems(problems: Readonly<Record<string, string>>): void {
    for (const [name, control] of Object.entries(this.form.controls)) {
      const reason = problems[name];
      control.setErrors(reason ? { server: `${this.label(name as LoanEditField)} ${reason}` } : null);
      control.markAsTouched();
    }
    this.problem.set(Object.keys(problems).length > 0 ? 'Some fields need attention.' : '');
  }
}
