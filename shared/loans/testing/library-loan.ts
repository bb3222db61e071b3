import type { LoanDates } from '../loan-state';

/** A library loan with no dates at all: each spec sets the dates its case is about. */
export const libraryLoan = (changes: Partial<LoanDates> = {}): LoanDates => ({
  kind: 'library',
  dueOn: null,
  returnedOn: null,
  readyOn: null,
  pickUpBy: null,
  holdOutcome: null,
  ...changes,
});
