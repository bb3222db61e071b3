import fc from 'fast-check';
import { dailyLog } from '../reading-log/daily-log';
import { dayIndex } from '../reading-log/day-index';
import { LogSession } from '../reading-log/log-session';
import { usualMinutesPerDay } from './usual-minutes-per-day';
import { expectProperty } from '../testing/expect-property';

const at = (iso: string, minutes: number): LogSession => ({
  startedAt: iso,
  endedAt: new Date(Date.parse(iso) + minutes * 60_000).toISOString(),
  activeMinutes: minutes,
});

describe('usualMinutesPerDay', () => {
  it('averages over every day of the window, days off included (hand-worked)', () => {
    // 60 minutes every Monday, Wednesday and Friday of February 2026 (2 Feb was a Monday):
    // 12 sessions × 60 = 720 minutes over the 28 days 1–28 February = 25.71 a day. The median of
    // reading days would say 60, more than twice the real progress.
    const days = [2, 4, 6, 9, 11, 13, 16, 18, 20, 23, 25, 27];
    const february = days.map((d) => at(`2026-02-${String(d).padStart(2, '0')}T19:00:00Z`, 60));
    // One session before the window, so the window is not shortened to the first reading day.
    const sessions = [at('2026-01-31T19:00:00Z', 60), ...february];
    expect(usualMinutesPerDay(sessions, '2026-02-28', 'UTC')).toBeCloseTo(720 / 28, 9);
  });

  it('starts the window at the first reading day for a new reader', () => {
    // First session 2 March, today 7 March: 90 minutes over 6 days = 15.
    const sessions = [at('2026-03-02T20:00:00Z', 60), at('2026-03-05T20:00:00Z', 30)];
    expect(usualMinutesPerDay(sessions, '2026-03-07', 'UTC')).toBe(15);
  });

  it('counts today and ignores days after it', () => {
    const sessions = [at('2026-03-01T08:00:00Z', 10), at('2026-03-07T08:00:00Z', 60), at('2026-03-08T08:00:00Z', 600)];
    // 1–7 March: 70 minutes over 7 days.
    expect(usualMinutesPerDay(sessions, '2026-03-07', 'UTC', 7)).toBe(10);
    // A 1-day window is today's minutes.
    expect(usualMinutesPerDay(sessions, '2026-03-07', 'UTC', 1)).toBe(60);
  });

  it('uses the reader’s local days: a late-evening session in Los Angeles, UTC and Tokyo', () => {
    // 2026-03-01T07:30Z–08:30Z, 60 minutes: 23:30–00:30 PST (28 Feb/1 Mar), 07:30–08:30 UTC and
    // 16:30–17:30 JST on 1 March (IANA tz database: PST = UTC−8, JST = UTC+9). Plus 20 minutes
    // on 2 March at 12:00Z, which is 2 March in all three zones.
    const sessions = [at('2026-03-01T07:30:00Z', 60), at('2026-03-02T12:00:00Z', 20)];
    // Los Angeles: the log starts 28 February (30 min), then 1 March (30), 2 March (20) → 80 / 3.
    expect(usualMinutesPerDay(sessions, '2026-03-02', 'America/Los_Angeles')).toBeCloseTo(80 / 3, 9);
    // UTC and Tokyo: 1 March (60) and 2 March (20) → 80 / 2.
    expect(usualMinutesPerDay(sessions, '2026-03-02', 'UTC')).toBe(40);
    expect(usualMinutesPerDay(sessions, '2026-03-02', 'Asia/Tokyo')).toBe(40);
  });

  it('is 0 without reading, and refuses a window of no days', () => {
    expect(usualMinutesPerDay([], '2026-03-07', 'UTC')).toBe(0);
    expect(usualMinutesPerDay([at('2026-04-01T08:00:00Z', 10)], '2026-03-07', 'UTC')).toBe(0);
    expect(() => usualMinutesPerDay([], '2026-03-07', 'UTC', 0)).toThrowError(RangeError);
  });

  it('scales with the minutes and never exceeds the minutes read in the window (property)', () => {
    const session = fc
      .tuple(fc.integer({ min: 0, max: 60 * 24 * 40 }), fc.integer({ min: 1, max: 240 }))
      .map(([minute, minutes]) => at(new Date(Date.UTC(2026, 1, 1) + minute * 60_000).toISOString(), minutes));
    expectProperty(
      fc.property(
        fc.array(session, { maxLength: 20 }),
        fc.constantFrom('UTC', 'America/Los_Angeles', 'Asia/Tokyo'),
        fc.integer({ min: 1, max: 28 }),
        (sessions, zone, window) => {
          const usual = usualMinutesPerDay(sessions, '2026-03-10', zone, window);
          const doubled = sessions.map((s) => ({ ...s, activeMinutes: 2 * s.activeMinutes }));
          return (
            Math.abs(usualMinutesPerDay(doubled, '2026-03-10', zone, window) - 2 * usual) < 1e-9 &&
            usual >= 0 &&
            usual <= sessions.reduce((sum, s) => sum + s.activeMinutes, 0) + 1e-9
          );
        },
      ),
    );
  });

  it('reads only the window’s sessions yet agrees with the mean over the whole log (property)', () => {
    // The definition above, over every session's days (dailyLog of all of them): sessions from
    // months before "today" up to after it, in zones at both ends of the offsets (UTC+14, UTC−11).
    const whole = (sessions: readonly LogSession[], today: string, zone: string, window: number) => {
      const log = dailyLog(sessions, zone);
      const windowStart = new Date((dayIndex(today) - window + 1) * 86_400_000).toISOString().slice(0, 10);
      if (!log[0]) return 0;
      const start = log[0].day > windowStart ? log[0].day : windowStart;
      if (start > today) return 0;
      const minutes = log.filter((e) => e.day >= start && e.day <= today).reduce((sum, e) => sum + e.minutes, 0);
      return minutes / (dayIndex(today) - dayIndex(start) + 1);
    };
    const session = fc
      .tuple(fc.integer({ min: 0, max: 60 * 24 * 120 }), fc.integer({ min: -30, max: 60 * 30 }), fc.integer({ min: 0, max: 90 }))
      .map(([minute, span, active]) => ({ ...at(new Date(Date.UTC(2026, 0, 1) + minute * 60_000).toISOString(), span), activeMinutes: active }));
    expectProperty(
      fc.property(
        fc.array(session, { maxLength: 25 }),
        fc.constantFrom('UTC', 'Pacific/Kiritimati', 'Pacific/Pago_Pago', 'America/Los_Angeles'),
        fc.integer({ min: 1, max: 40 }),
        (sessions, zone, window) => Math.abs(usualMinutesPerDay(sessions, '2026-03-10', zone, window) - whole(sessions, '2026-03-10', zone, window)) < 1e-9,
      ),
    );
  });
});
