import { dueText } from '@shared/loans/due-in-zone';
import { daysFrom, loanState, type LoanState } from '@shared/loans/loan-state';
import { renewalsText } from '@shared/loans/renew-loan';
import { keyDay } from '@shared/loans/urgency';
import { type Book, type Library, type Loan, LOAN_KINDS } from '@shared/sync/schema/collections';

/** What a loan row shows: its book, who or where, and a line on where it stands. */
export interface LoanView {
  readonly loan: Loan;
  readonly state: LoanState;
  readonly title: string;
  readonly bookId: string | null;
  /** "Northgate Library" or "lent to Pim" — from the reader's own records, shown only in the app. */
  readonly where: string;
  readonly status: string;
  readonly renewals: string | null;
  readonly urgent: boolean;
}

const KIND_WORDS: Record<(typeof LOAN_KINDS)[number], string> = { library: 'Library loan', hold: 'Hold', lentOut: 'Lent out', borrowed: 'Borrowed from a friend' };

function statusLine(loan: Loan, state: LoanState, today: string): string {
  const day = keyDay(loan);
  const days = day ? daysFrom(today, day) : null;
  switch (state) {
    case 'holdReady':
      return days === null
        ? 'Ready to pick up'
        : `Ready to pick up — ${days === 0 ? 'last day today' : days === 1 ? 'pick up by tomorrow' : `pick up within ${days} days`}`;
    case 'holdWaiting':
      return loan.queuePosition ? `Waiting, number ${loan.queuePosition} in the queue` : 'Waiting in the queue';
    case 'lentOut':
      return days === null ? 'With your friend' : `Expected back ${days === 0 ? 'today' : days === 1 ? 'tomorrow' : `in ${days} days`}`;
    case 'lentOverdue':
      return `Expected back ${-(days ?? 0)} ${days === -1 ? 'day' : 'days'} ago`;
    case 'closed':
      return loan.returnedOn ? `Returned ${loan.returnedOn}` : loan.holdOutcome ? `Hold ${loan.holdOutcome}` : 'Closed';
    default:
      return days === null ? 'No due date' : dueText(days, 'Due');
  }
}

/** The row a list or card shows for one loan on the reader's day `today`. */
export function loanView(loan: Loan, today: string, books: ReadonlyMap<string, Book>, libraries: ReadonlyMap<string, Library>): LoanView {
  const state = loanState(loan, today);
  const library = loan.libraryId ? libraries.get(loan.libraryId) : undefined;
  const friend = loan.friendName ?? 'a friend';
  const where =
    loan.kind === 'lentOut'
      ? `Lent to ${friend}`
      : loan.kind === 'borrowed'
        ? `Borrowed from ${friend}`
        : `${KIND_WORDS[loan.kind ?? 'library']}${library ? ` · ${library.name}` : ''}`;
  return {
    loan,
    state,
    title: (loan.bookId && books.get(loan.bookId)?.title) || 'A book not on this device yet',
    bookId: loan.bookId ?? null,
    where,
    status: statusLine(loan, state, today),
    renewals: loan.kind === 'library' && state !== 'closed' ? renewalsText(loan) : null,
    urgent: state === 'overdue' || state === 'dueSoon' || state === 'holdReady' || state === 'lentOverdue',
  };
}
