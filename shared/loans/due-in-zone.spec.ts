import { daysUntilDue, dueText } from './due-in-zone';

/**
 * The reference: the platform's own ICU time-zone data through Intl.DateTimeFormat (en-CA
 * prints YYYY-MM-DD), independent of our date-fns path. Offsets and DST dates from the IANA tz
 * database: Los Angeles springs forward 8 March 2026 at 10:00 UTC, London 29 March 2026 at
 * 01:00 UTC and back 25 October 2026 at 01:00 UTC; Kiritimati is UTC+14 all year.
 */
function icuDay(instant: string, timeZone: string): string {
  return new Intl.DateTimeFormat('en-CA', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit' }).format(new Date(instant));
}
const days = (from: string, to: string) => (Date.parse(`${to}T00:00:00Z`) - Date.parse(`${from}T00:00:00Z`)) / 86_400_000;

describe("daysUntilDue in the reader's zone", () => {
  it('is due on the 5th where the reader lives: one instant, three zones', () => {
    const now = '2026-03-04T10:30:00Z';
    expect(daysUntilDue('2026-03-05', now, 'Pacific/Kiritimati')).toBe(0); // 00:30 on the 5th
    expect(daysUntilDue('2026-03-05', now, 'Europe/London')).toBe(1); // 10:30 on the 4th
    expect(daysUntilDue('2026-03-05', now, 'America/Los_Angeles')).toBe(1); // 02:30 on the 4th
    expect(daysUntilDue('2026-03-05', '2026-03-04T07:59:00Z', 'America/Los_Angeles')).toBe(2); // 23:59 on the 3rd
  });

  it("turns the day at local midnight across Los Angeles' spring change (UTC−8 then UTC−7)", () => {
    // 07:30 UTC is 23:30 on 7 March (PST) but 00:30 on 9 March (PDT): the same UTC time, a different side of midnight.
    expect(daysUntilDue('2026-03-09', '2026-03-08T07:30:00Z', 'America/Los_Angeles')).toBe(2);
    expect(daysUntilDue('2026-03-09', '2026-03-09T07:30:00Z', 'America/Los_Angeles')).toBe(0);
  });

  it("turns the day at local midnight across London's changes to BST and back", () => {
    expect(daysUntilDue('2026-03-29', '2026-03-28T23:30:00Z', 'Europe/London')).toBe(1); // GMT: 23:30 on the 28th
    expect(daysUntilDue('2026-10-25', '2026-10-24T23:30:00Z', 'Europe/London')).toBe(0); // BST: 00:30 on the 25th
    expect(daysUntilDue('2026-10-26', '2026-10-25T23:30:00Z', 'Europe/London')).toBe(1); // GMT again: 23:30 on the 25th
  });

  it('agrees with ICU every 30 minutes across both March changes in all three zones', () => {
    for (const timeZone of ['America/Los_Angeles', 'Pacific/Kiritimati', 'Europe/London']) {
      for (let t = Date.parse('2026-03-07T00:00:00Z'); t <= Date.parse('2026-03-30T00:00:00Z'); t += 1_800_000) {
        const now = new Date(t).toISOString();
        expect(daysUntilDue('2026-03-20', now, timeZone))
          .withContext(`${timeZone} ${now}`)
          .toBe(days(icuDay(now, timeZone), '2026-03-20'));
      }
    }
  });

  it('says it in words', () => {
    expect([dueText(0), dueText(1), dueText(4), dueText(-1), dueText(-3)]).toEqual([
      'due today',
      'due tomorrow',
      'due in 4 days',
      '1 day overdue',
      '3 days overdue',
    ]);
  });
});
