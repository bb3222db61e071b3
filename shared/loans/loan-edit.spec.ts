import { loans } from '../sync/schema/collections';
import { changedLoanFields, LOAN_EDIT_FIELDS, loanEditProblems } from './loan-edit';

describe('loanEditProblems', () => {
  it('gives the shared schema’s own reasons for a bad value (the server refuses the same)', () => {
    expect(loanEditProblems({ kind: 'hold' }, { queuePosition: 0 })).toEqual({ queuePosition: 'must be at least 1' });
    expect(loanEditProblems({ kind: 'hold' }, { queuePosition: 2.5 })).toEqual({ queuePosition: 'must be a whole number' });
    expect(loanEditProblems({ kind: 'library' }, { renewalsAllowed: 100 })).toEqual({ renewalsAllowed: 'must be at most 99' });
    expect(loanEditProblems({ kind: 'library' }, { dueOn: '5 March' })).toEqual({ dueOn: 'must be a date like 2026-03-08' });
    expect(loanEditProblems({ kind: 'lentOut' }, { friendName: 'x'.repeat(121) })).toEqual({ friendName: 'must be at most 120 characters' });
  });

  it('checks the order of the days on the loan as it would be after the edit', () => {
    const loan = { kind: 'library' as const, startedOn: '2026-03-10', dueOn: '2026-03-31' };
    expect(loanEditProblems(loan, { dueOn: '2026-03-01' })).toEqual({ dueOn: 'must not be before the day it started' });
    expect(loanEditProblems(loan, { returnedOn: '2026-03-09' })).toEqual({ returnedOn: 'must not be before the day it started' });
    // The same day is fine: a loan returned the day it was borrowed.
    expect(loanEditProblems(loan, { returnedOn: '2026-03-10' })).toEqual({});
    expect(loanEditProblems({ kind: 'hold', readyOn: '2026-03-10' }, { pickUpBy: '2026-03-09' })).toEqual({ pickUpBy: 'must not be before the day it was ready' });
  });

  it('refuses more renewals used than allowed, and a friend with no name', () => {
    expect(loanEditProblems({ kind: 'library', renewalsAllowed: 2 }, { renewalsUsed: 3 })).toEqual({ renewalsUsed: 'must be at most the renewals allowed (2)' });
    expect(loanEditProblems({ kind: 'library', renewalsUsed: 2 }, { renewalsAllowed: 2 })).toEqual({});
    expect(loanEditProblems({ kind: 'lentOut', friendName: 'Pim' }, { friendName: '  ' })).toEqual({ friendName: 'is needed: who has it, or whose it is' });
  });

  it('lets a hold’s place in the queue change, and lists only fields the shared schema has', () => {
    expect(loanEditProblems({ kind: 'hold', queuePosition: 7 }, { queuePosition: 3 })).toEqual({});
    const fields = Object.keys(loans.fields);
    for (const list of Object.values(LOAN_EDIT_FIELDS)) for (const name of list) expect(fields).toContain(name);
    expect(LOAN_EDIT_FIELDS.hold).toContain('queuePosition');
  });
});

describe('changedLoanFields', () => {
  it('keeps only what changed (an empty field and a missing one are the same)', () => {
    expect(changedLoanFields({ dueOn: '2026-03-16', returnedOn: null }, { dueOn: '2026-03-20', returnedOn: null, pickUpBy: null })).toEqual({ dueOn: '2026-03-20' });
  });
});
