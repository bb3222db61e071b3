import type { CaughtMail } from '@shared/api/admin';

import { groupCaughtMail } from './mail';

const mail = (id: string, to: string, subject: string): CaughtMail => ({
  id,
  receivedAt: `2026-03-0${id}T10:00:00.000Z`,
  from: 'lamplight@example.test',
  to: [to],
  subject,
  text: '',
});

describe('groupCaughtMail', () => {
  it('puts mail to the same recipient with the same subject together, newest group first', () => {
    const groups = groupCaughtMail([
      mail('4', 'ada@example.test', 'Reset your password'),
      mail('3', 'kit@example.test', 'Welcome'),
      mail('2', 'ada@example.test', 'Reset your password'),
      mail('1', 'ada@example.test', 'Welcome'),
    ]);

    expect(groups.map((group) => [group.to, group.subject, group.messages.map((m) => m.id)])).toEqual([
      ['ada@example.test', 'Reset your password', ['4', '2']],
      ['kit@example.test', 'Welcome', ['3']],
      ['ada@example.test', 'Welcome', ['1']],
    ]);
  });
});
