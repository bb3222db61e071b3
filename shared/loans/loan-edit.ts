import { loans, type Loan, type LOAN_KINDS } from '../sync/schema/collections';
import { validatePatch } from '../sync/validate-patch';

type LoanKind = (typeof LOAN_KINDS)[number];

/** The fields a reader edits on a loan, a hold or a lending (the kind and the book stay). */
export type LoanEditField =
  'libraryId' | 'friendName' | 'startedOn' | 'dueOn' | 'renewalsUsed' | 'renewalsAllowed' | 'returnedOn' | 'queuePosition' | 'readyOn' | 'pickUpBy';

export type LoanEdit = Partial<Pick<Loan, LoanEditField>>;

/** Which fields each kind shows in its edit form, in order. */
export const LOAN_EDIT_FIELDS: Readonly<Record<LoanKind, readonly LoanEditField[]>> = {
  library: ['libraryId', 'startedOn', 'dueOn', 'renewalsUsed', 'renewalsAllowed', 'returnedOn'],
  hold: ['libraryId', 'startedOn', 'queuePosition', 'readyOn', 'pickUpBy'],
  lentOut: ['friendName', 'startedOn', 'dueOn', 'returnedOn'],
  borrowed: ['friendName', 'startedOn', 'dueOn', 'returnedOn'],
};

/** Pairs of days where the second may not come before the first, with the reason given on the second. */
const ORDER: readonly (readonly [LoanEditField, LoanEditField, string])[] = [
  ['startedOn', 'dueOn', 'must not be before the day it started'],
  ['startedOn', 'returnedOn', 'must not be before the day it started'],
  ['startedOn', 'readyOn', 'must not be before the hold was placed'],
  ['readyOn', 'pickUpBy', 'must not be before the day it was ready'],
];

/**
 * What is wrong with an edit of a loan, by field: first the shared schema's reasons (the same the
 * server gives, `validatePatch`), then the rules between fields, checked on the loan as it would
 * be after the edit. Empty when it may be saved.
 *
 * @example
 * loanEditProblems({ kind: 'hold' }, { queuePosition: 0 }) // { queuePosition: 'must be at least 1' }
 * loanEditProblems({ kind: 'library', startedOn: '2026-03-10' }, { dueOn: '2026-03-01' }) // { dueOn: 'must not be before the day it started' }
 */
export function loanEditProblems(loan: Pick<Loan, 'kind'> & LoanEdit, edit: LoanEdit): Record<string, string> {
  const problems = validatePatch(loans, edit);
  const after: LoanEdit = { ...loan, ...edit };
  if ((loan.kind === 'lentOut' || loan.kind === 'borrowed') && 'friendName' in edit && !after.friendName?.trim()) {
    problems['friendName'] ??= 'is needed: who has it, or whose it is';
  }
  for (const [first, second, reason] of ORDER) {
    const [a, b] = [after[first], after[second]];
    if (typeof a === 'string' && typeof b === 'string' && b < a && !problems[first] && !problems[second]) problems[second] = reason;
  }
  const { renewalsUsed: used, renewalsAllowed: allowed } = after;
  if (typeof used === 'number' && typeof allowed === 'number' && used > allowed && !problems['renewalsUsed'] && !problems['renewalsAllowed']) {
    problems['renewalsUsed'] = `must be at most the renewals allowed (${allowed})`;
  }
  return problems;
}

/** Only the fields whose value the edit changes, so another device's edit of the rest still stands (per-field LWW). */
export function changedLoanFields(loan: LoanEdit, edit: LoanEdit): LoanEdit {
  return Object.fromEntries(Object.entries(edit).filter(([field, value]) => (loan[field as LoanEditField] ?? null) !== (value ?? null))) as LoanEdit;
}
