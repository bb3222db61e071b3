import type { Loan } from '../sync/schema/collections';
import { libraryLoan } from './testing/library-loan';
import { byUrgency } from './urgency';

type Row = Pick<Loan, 'id' | 'kind' | 'dueOn' | 'returnedOn' | 'readyOn' | 'pickUpBy' | 'holdOutcome'>;
const row = (id: string, changes: Partial<Row>): Row => ({ id, ...libraryLoan(changes) });

describe('byUrgency', () => {
  it('lists overdue, ready holds, due soon, lent overdue, other loans, lent out, waiting holds, then closed', () => {
    const today = '2026-03-10';
    const loans = [
      row('returned', { dueOn: '2026-03-01', returnedOn: '2026-03-02' }),
      row('waiting', { kind: 'hold' }),
      row('lent', { kind: 'lentOut', dueOn: '2026-04-01' }),
      row('later', { dueOn: '2026-03-30' }),
      row('lent-late', { kind: 'lentOut', dueOn: '2026-03-01' }),
      row('soon', { dueOn: '2026-03-11' }),
      row('ready', { kind: 'hold', readyOn: '2026-03-09', pickUpBy: '2026-03-15' }),
      row('overdue', { dueOn: '2026-03-08' }),
    ];
    expect(byUrgency(loans, today).map((loan) => loan.id)).toEqual(['overdue', 'ready', 'soon', 'lent-late', 'later', 'lent', 'waiting', 'returned']);
  });

  it('puts the most overdue first and the nearest due date first, a loan without a date last', () => {
    const today = '2026-03-10';
    const loans = [
      row('a', { dueOn: '2026-03-09' }),
      row('b', { dueOn: '2026-03-02' }),
      row('c', { dueOn: '2026-03-20' }),
      row('d', {}),
      row('e', { dueOn: '2026-03-14' }),
    ];
    expect(byUrgency(loans, today).map((loan) => loan.id)).toEqual(['b', 'a', 'e', 'c', 'd']);
  });
});
