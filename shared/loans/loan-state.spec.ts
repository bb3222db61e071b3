import { type LoanDates, loanState, needsAttention } from './loan-state';
import { libraryLoan } from './testing/library-loan';

const library = (changes: Partial<LoanDates> = {}): LoanDates => libraryLoan({ dueOn: '2026-03-05', ...changes });

describe('loanState', () => {
  it('counts a loan due today, tomorrow or the day after as due soon, and three days ahead as out', () => {
    expect(loanState(library(), '2026-03-05')).toBe('dueSoon');
    expect(loanState(library(), '2026-03-03')).toBe('dueSoon');
    expect(loanState(library(), '2026-03-02')).toBe('out');
  });

  it('is overdue from the day after the due date, and closed once returned', () => {
    expect(loanState(library(), '2026-03-06')).toBe('overdue');
    expect(loanState(library({ returnedOn: '2026-03-07' }), '2026-03-09')).toBe('closed');
  });

  it('counts a book borrowed from a friend like a loan, and a book lent out by its expected date', () => {
    expect(loanState(library({ kind: 'borrowed' }), '2026-03-06')).toBe('overdue');
    expect(loanState(library({ kind: 'lentOut' }), '2026-03-05')).toBe('lentOut');
    expect(loanState(library({ kind: 'lentOut' }), '2026-03-06')).toBe('lentOverdue');
    expect(loanState(library({ kind: 'lentOut', dueOn: null }), '2026-03-06')).toBe('lentOut');
  });

  it('follows a hold from the queue to ready, and closes it when collected or past its pick-up-by day', () => {
    const hold = library({ kind: 'hold', dueOn: null, readyOn: '2026-03-04', pickUpBy: '2026-03-10' });
    expect(loanState(hold, '2026-03-03')).toBe('holdWaiting');
    expect(loanState(hold, '2026-03-04')).toBe('holdReady');
    expect(loanState(hold, '2026-03-10')).toBe('holdReady');
    expect(loanState(hold, '2026-03-11')).toBe('closed');
    expect(loanState({ ...hold, holdOutcome: 'collected' }, '2026-03-05')).toBe('closed');
  });

  it('puts due soon, overdue and ready holds on Today, and nothing else', () => {
    expect(['overdue', 'dueSoon', 'holdReady'].every((state) => needsAttention(state as never))).toBeTrue();
    expect(['out', 'lentOut', 'lentOverdue', 'holdWaiting', 'closed'].some((state) => needsAttention(state as never))).toBeFalse();
  });
});
