import type { Loan } from '../sync/schema/collections';
import { remindersDue } from './reminders';

const loan = (id: string, changes: Partial<Loan>): Loan => ({ id, kind: 'library', bookId: null, dueOn: null, ...changes }) as Loan;

describe('remindersDue', () => {
  const today = '2026-03-03';

  it('reminds of a loan due within the chosen days (default 2), once per due date', () => {
    const loans = [
      loan('a', { dueOn: '2026-03-05' }),
      loan('b', { dueOn: '2026-03-06' }),
      loan('c', { dueOn: '2026-03-01' }),
      loan('d', { dueOn: '2026-03-04', returnedOn: '2026-03-02' }),
    ];
    expect(remindersDue(loans, {}, today).map((i) => i.key)).toEqual(['due:c:2026-03-01', 'due:a:2026-03-05']);
    expect(remindersDue(loans, { daysBefore: 3 }, today).map((i) => i.key)).toContain('due:b:2026-03-06');
  });

  it('reminds of ready holds and lent books past their date only when chosen', () => {
    const loans = [loan('h', { kind: 'hold', readyOn: '2026-03-02', pickUpBy: '2026-03-09' }), loan('l', { kind: 'lentOut', dueOn: '2026-03-01' })];
    expect(remindersDue(loans, {}, today).map((i) => i.kind)).toEqual(['lentOverdue', 'holdReady']);
    expect(remindersDue(loans, { holdReady: false, lentOverdue: false }, today)).toEqual([]);
  });
});
