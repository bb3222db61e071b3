import type { Loan } from '../sync/schema/collections';
import { daysFrom, type LoanState, loanState } from './loan-state';

/** The order the Loans screen lists states in: what needs doing soonest first. */
const STATE_RANK: Record<LoanState, number> = {
  overdue: 0,
  holdReady: 1,
  dueSoon: 2,
  lentOverdue: 3,
  out: 4,
  lentOut: 5,
  holdWaiting: 6,
  closed: 7,
};

/** The day that matters for a loan in a state: the due date, or a ready hold's pick-up-by. */
export function keyDay(loan: Pick<Loan, 'kind' | 'dueOn' | 'pickUpBy'>): string | null {
  return (loan.kind === 'hold' ? loan.pickUpBy : loan.dueOn) ?? null;
}

type Sortable = Pick<Loan, 'id' | 'kind' | 'dueOn' | 'returnedOn' | 'readyOn' | 'pickUpBy' | 'holdOutcome'>;

/**
 * Loans sorted by urgency on the reader's day `today`: overdue, holds ready, due soon, the
 * reader's books overdue with friends, other loans, books lent out, holds waiting, then closed
 * ones. Within a state the nearest day comes first (the most overdue first); a loan without a
 * day comes last in its state; ties keep a stable order by id.
 */
export function byUrgency<T extends Sortable>(loans: readonly T[], today: string): T[] {
  const ranked = loans.map((loan) => {
    const day = keyDay(loan);
    return { loan, rank: STATE_RANK[loanState(loan, today)], days: day ? daysFrom(today, day) : Number.POSITIVE_INFINITY };
  });
  ranked.sort((a, b) => a.rank - b.rank || a.days - b.days || (a.loan.id < b.loan.id ? -1 : a.loan.id > b.loan.id ? 1 : 0));
  return ranked.map((entry) => entry.loan);
}
