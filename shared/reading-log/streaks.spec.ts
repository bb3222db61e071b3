import { addDays, format } from 'date-fns';
import { tz } from '@date-fns/tz';
import fc from 'fast-check';
import { dailyLog } from './daily-log';
import { streaks } from './streaks';
import { expectProperty } from '../testing/expect-property';

describe('streaks', () => {
  it('counts a run ending today', () => {
    // Hand-worked: 6, 7, 8 March are three days in a row; 1 March stands alone.
    const days = ['2026-03-06', '2026-03-07', '2026-03-08', '2026-03-01'];
    expect(streaks(days, '2026-03-08')).toEqual({ current: 3, longest: 3 });
  });

  it('keeps the streak alive when the last reading day is yesterday (the reader still has today)', () => {
    expect(streaks(['2026-03-05', '2026-03-06', '2026-03-07'], '2026-03-08')).toEqual({ current: 3, longest: 3 });
  });

  it('breaks it when the last reading day is the day before yesterday', () => {
    expect(streaks(['2026-03-05', '2026-03-06'], '2026-03-08')).toEqual({ current: 0, longest: 2 });
  });

  it('remembers a longer run from the past', () => {
    expect(streaks(['2026-01-10', '2026-01-11', '2026-01-12', '2026-01-13', '2026-03-07', '2026-03-08'], '2026-03-08')).toEqual({ current: 2, longest: 4 });
  });

  it('runs across month, year and the leap day of 2028', () => {
    // Gregorian calendar: 2028 is a leap year, so 28 Feb → 29 Feb → 1 Mar are consecutive.
    expect(streaks(['2028-02-28', '2028-02-29', '2028-03-01'], '2028-03-01')).toEqual({ current: 3, longest: 3 });
    // 2026 is not: 28 Feb → 1 Mar is consecutive.
    expect(streaks(['2026-02-28', '2026-03-01'], '2026-03-01')).toEqual({ current: 2, longest: 2 });
    expect(streaks(['2026-12-31', '2027-01-01'], '2027-01-02')).toEqual({ current: 2, longest: 2 });
  });

  it('ignores duplicates, order and days after today', () => {
    expect(streaks(['2026-03-08', '2026-03-07', '2026-03-08', '2026-03-09', '2026-03-10'], '2026-03-08')).toEqual({
      current: 2,
      longest: 2,
    });
  });

  it('is zero for no reading', () => {
    expect(streaks([], '2026-03-08')).toEqual({ current: 0, longest: 0 });
  });

  it('counts an evening reader’s days across the US DST switch in their own zone', () => {
    // Every evening 22:00–22:30 Los Angeles time, 6–10 March 2026; DST starts 8 March
    // (EPAct 2005), so 22:00 is 06:00Z before and 05:00Z from 8 March. In UTC the same sessions
    // fall on 7–11 March; in Tokyo (UTC+9) on 7–11 March too, at 14:00/15:00 JST.
    const starts = ['2026-03-07T06:00', '2026-03-08T06:00', '2026-03-09T05:00', '2026-03-10T05:00', '2026-03-11T05:00'];
    const sessions = starts.map((s) => ({ startedAt: `${s}:00Z`, endedAt: `${s.slice(0, -2)}30:00Z`, activeMinutes: 30 }));
    const days = (zone: string) => dailyLog(sessions, zone).map((e) => e.day);
    expect(days('America/Los_Angeles')).toEqual(['2026-03-06', '2026-03-07', '2026-03-08', '2026-03-09', '2026-03-10']);
    expect(streaks(days('America/Los_Angeles'), '2026-03-10')).toEqual({ current: 5, longest: 5 });
    // On 10 March a UTC or Tokyo reader's log holds 11 March, a day still to come: ignored.
    expect(streaks(days('UTC'), '2026-03-10')).toEqual({ current: 4, longest: 4 });
    expect(streaks(days('Asia/Tokyo'), '2026-03-10')).toEqual({ current: 4, longest: 4 });
  });

  it('gives n for n days in a row ending today, built with date-fns addDays (npm reference) (property)', () => {
    expectProperty(
      fc.property(
        fc.date({ min: new Date('2000-01-01T00:00:00Z'), max: new Date('2099-12-31T00:00:00Z'), noInvalidDate: true }),
        fc.integer({ min: 1, max: 800 }),
        fc.integer({ min: 0, max: 1 }),
        (date, n, endOffset) => {
          const utc = tz('UTC');
          const today = format(date, 'yyyy-MM-dd', { in: utc });
          const dayBefore = (i: number) => format(addDays(date, -i - endOffset, { in: utc }), 'yyyy-MM-dd', { in: utc });
          const run = Array.from({ length: n }, (_, i) => dayBefore(i));
          const whole = streaks(run, today);
          if (whole.current !== n || whole.longest !== n) return false;
          if (n < 3) return true;
          // Breaking the run in the middle leaves the longer half as longest.
          const gap = Math.floor(n / 2);
          const broken = streaks(
            run.filter((_, i) => i !== gap),
            today,
          );
          return broken.current === gap && broken.longest === Math.max(gap, n - gap - 1);
        },
      ),
      { numRuns: 200 },
    );
  });

  it('does not depend on order or duplicates, and longest ≥ current (property)', () => {
    const day = fc.integer({ min: 0, max: 60 }).map((i) => new Date(Date.UTC(2026, 0, 1 + i)).toISOString().slice(0, 10));
    expectProperty(
      fc.property(fc.array(day, { maxLength: 40 }), day, (days, today) => {
        const result = streaks(days, today);
        const again = streaks([...days].reverse().concat(days), today);
        return again.current === result.current && again.longest === result.longest && result.longest >= result.current && result.longest <= new Set(days).size;
      }),
    );
  });
});
