import { monthAccount, type MonthAccountInput } from './month-account';

const empty: MonthAccountInput = { month: '2026-03', today: '2026-03-16', timeZone: 'Europe/Oslo', sessions: [], statusChanges: [], readings: [], quotes: [] };

describe('monthAccount', () => {
  it('counts the month’s sessions, minutes and days on the reader’s local days (Oslo: UTC+1 in March)', () => {
    const account = monthAccount({
      ...empty,
      sessions: [
        { startedAt: '2026-02-28T23:30:00.000Z', activeMinutes: 20 }, // 1 March 00:30 in Oslo: in
        { startedAt: '2026-03-01T18:00:00.000Z', activeMinutes: 40 },
        { startedAt: '2026-03-31T23:10:00.000Z', activeMinutes: 90 }, // 1 April 01:10 (CEST): out
        { startedAt: '2026-03-10T08:00:00.000Z', activeMinutes: 15 },
      ],
    });
    expect([account.sessions, account.minutes, account.readingDays]).toEqual([3, 75, 2]);
  });

  it('lists books started and abandoned once each, in order, and counts the quotes kept', () => {
    const account = monthAccount({
      ...empty,
      readings: [
        { bookId: 'b', startedOn: '2026-03-09' },
        { bookId: 'x', startedOn: '2026-02-27' },
      ],
      statusChanges: [
        { bookId: 'a', status: 'reading', changedAt: '2026-03-02T10:00:00.000Z' },
        { bookId: 'b', status: 'reading', changedAt: '2026-03-09T10:00:00.000Z' },
        { bookId: 'a', status: 'dnf', changedAt: '2026-03-20T10:00:00.000Z' },
        { bookId: 'c', status: 'dnf', changedAt: '2026-04-02T10:00:00.000Z' },
      ],
      quotes: [{ capturedAt: '2026-03-05T12:00:00.000Z' }, { capturedAt: '2026-02-05T12:00:00.000Z' }, { capturedAt: null }],
    });
    expect(account.started).toEqual(['a', 'b']);
    expect(account.abandoned).toEqual(['a']);
    expect(account.quotes).toBe(1);
  });

  it('puts an even pace at the share of the month gone before today (March has 31 days, per the Gregorian calendar)', () => {
    expect(monthAccount(empty).evenShare).toBeCloseTo(15 / 31, 10);
    expect(monthAccount({ ...empty, today: '2026-02-10' }).evenShare).toBe(0);
    expect(monthAccount({ ...empty, today: '2026-04-01' }).evenShare).toBe(1);
    expect(monthAccount({ ...empty, month: '2028-02', today: '2028-02-15' }).evenShare).toBeCloseTo(14 / 29, 10);
  });
});
