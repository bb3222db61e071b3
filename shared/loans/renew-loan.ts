import { dayFromIndex } from '../reading-log/day-from-index';
import { dayIndex } from '../reading-log/day-index';
import type { Loan } from '../sync/schema/collections';

/** The fields a renewal writes. */
export interface Renewal {
  readonly dueOn: string;
  readonly renewalsUsed: number;
}

/** Why a renewal cannot be made, in words the reader sees. */
export type RenewalRefusal = { readonly refused: string };

/**
 * Renew a library loan: the new due date and one more renewal used. Without `newDueOn` the loan
 * is extended by `loanDays` from its current due date (the library's usual period).
 *
 * @example
 * renewLoan({ kind: 'library', dueOn: '2026-03-05', renewalsUsed: 0, renewalsAllowed: 2, … }, { loanDays: 21 })
 * // { dueOn: '2026-03-26', renewalsUsed: 1 }
 */
export function renewLoan(
  loan: Pick<Loan, 'kind' | 'dueOn' | 'renewalsUsed' | 'renewalsAllowed' | 'returnedOn'>,
  options: { readonly newDueOn?: string; readonly loanDays?: number },
): Renewal | RenewalRefusal {
  if (loan.kind !== 'library') return { refused: 'Only a library loan can be renewed.' };
  if (loan.returnedOn) return { refused: 'This loan has been returned.' };
  const used = loan.renewalsUsed ?? 0;
  if (loan.renewalsAllowed != null && used >= loan.renewalsAllowed) {
    return { refused: loan.renewalsAllowed === 1 ? 'The one renewal allowed has been used.' : `All ${loan.renewalsAllowed} renewals have been used.` };
  }
  const dueOn = options.newDueOn ?? (loan.dueOn && options.loanDays ? dayFromIndex(dayIndex(loan.dueOn) + options.loanDays) : null);
  if (!dueOn) return { refused: 'Choose the new due date.' };
  if (loan.dueOn && dueOn <= loan.dueOn) return { refused: 'The new due date must be after the current one.' };
  return { dueOn, renewalsUsed: used + 1 };
}

/** "1 of 3 renewals used", or "2 renewals used" when the library's limit is unknown. */
export function renewalsText(loan: Pick<Loan, 'renewalsUsed' | 'renewalsAllowed'>): string {
  const used = loan.renewalsUsed ?? 0;
  const noun = (n: number) => (n === 1 ? 'renewal' : 'renewals');
  return loan.renewalsAllowed != null ? `${used} of ${loan.renewalsAllowed} ${noun(loan.renewalsAllowed)} used` : `${used} ${noun(used)} used`;
}
