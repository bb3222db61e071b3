import { renewLoan, renewalsText } from './renew-loan';

const loan = { kind: 'library' as const, dueOn: '2026-03-05', renewalsUsed: 0, renewalsAllowed: 2, returnedOn: null };

describe('renewLoan', () => {
  it('moves the due date by the library period and counts the renewal', () => {
    // 5 March + 21 days = 26 March (March has 31 days).
    expect(renewLoan(loan, { loanDays: 21 })).toEqual({ dueOn: '2026-03-26', renewalsUsed: 1 });
  });

  it('crosses a month and a leap day: 20 Feb 2028 + 14 days = 5 March 2028', () => {
    expect(renewLoan({ ...loan, dueOn: '2028-02-20' }, { loanDays: 14 })).toEqual({ dueOn: '2028-03-05', renewalsUsed: 1 });
  });

  it('takes a chosen new date, and refuses one that is not later', () => {
    expect(renewLoan(loan, { newDueOn: '2026-03-19' })).toEqual({ dueOn: '2026-03-19', renewalsUsed: 1 });
    expect(renewLoan(loan, { newDueOn: '2026-03-05' })).toEqual({ refused: 'The new due date must be after the current one.' });
  });

  it('refuses once every renewal is used, a returned loan, and a hold', () => {
    expect(renewLoan({ ...loan, renewalsUsed: 2 }, { loanDays: 7 })).toEqual({ refused: 'All 2 renewals have been used.' });
    expect(renewLoan({ ...loan, returnedOn: '2026-03-01' }, { loanDays: 7 })).toEqual({ refused: 'This loan has been returned.' });
    expect(renewLoan({ ...loan, kind: 'hold' as never }, { loanDays: 7 })).toEqual({ refused: 'Only a library loan can be renewed.' });
  });

  it('shows the count', () => {
    expect(renewalsText({ renewalsUsed: 1, renewalsAllowed: 3 })).toBe('1 of 3 renewals used');
    expect(renewalsText({ renewalsUsed: null, renewalsAllowed: null })).toBe('0 renewals used');
  });
});
