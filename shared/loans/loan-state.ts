import { dayIndex } from '../reading-log/day-index';
import type { Loan } from '../sync/schema/collections';

/** Days ahead (today included as 0) in which a due date counts as "due soon": the Today card's window. */
export const DUE_SOON_DAYS = 3;

/**
 * Where a loan stands on the reader's local day `today`:
 * - `overdue` / `dueSoon` / `out`: a library loan or a friend's book not yet returned (by due date);
 * - `lentOverdue` / `lentOut`: the reader's book with a friend, past or before its expected date;
 * - `holdReady` / `holdWaiting`: a hold, ready to pick up or still in the queue;
 * - `closed`: returned, or a hold collected, cancelled or expired (or past its pick-up-by day).
 */
export type LoanState = 'overdue' | 'dueSoon' | 'out' | 'lentOverdue' | 'lentOut' | 'holdReady' | 'holdWaiting' | 'closed';

/** The fields the state depends on (a whole `Loan` will do). */
export type LoanDates = Pick<Loan, 'kind' | 'dueOn' | 'returnedOn' | 'readyOn' | 'pickUpBy' | 'holdOutcome'> & { deleted?: boolean | null };

/** Whole days from `today` to `day` (negative: past), both local 'YYYY-MM-DD' days. */
export function daysFrom(today: string, day: string): number {
  return dayIndex(day) - dayIndex(today);
}

/**
 * @example
 * loanState({ kind: 'library', dueOn: '2026-03-05', … }, '2026-03-03') // 'dueSoon' (2 days left)
 * loanState({ kind: 'library', dueOn: '2026-03-05', … }, '2026-03-06') // 'overdue'
 */
export function loanState(loan: LoanDates, today: string): LoanState {
  if (loan.deleted) return 'closed';
  if (loan.kind === 'hold') {
    if (loan.holdOutcome) return 'closed';
    if (loan.pickUpBy && daysFrom(today, loan.pickUpBy) < 0) return 'closed';
    return loan.readyOn && daysFrom(today, loan.readyOn) <= 0 ? 'holdReady' : 'holdWaiting';
  }
  if (loan.returnedOn) return 'closed';
  const left = loan.dueOn ? daysFrom(today, loan.dueOn) : null;
  if (loan.kind === 'lentOut') return left !== null && left < 0 ? 'lentOverdue' : 'lentOut';
  if (left === null) return 'out';
  if (left < 0) return 'overdue';
  return left < DUE_SOON_DAYS ? 'dueSoon' : 'out';
}

/** Whether the state still asks something of the reader (anything but `closed`). */
export const isOpen = (state: LoanState) => state !== 'closed';

/** Whether Today should show it: due within 3 days (today, tomorrow, the day after), overdue, or a hold ready. */
export const needsAttention = (state: LoanState) => state === 'overdue' || state === 'dueSoon' || state === 'holdReady';
