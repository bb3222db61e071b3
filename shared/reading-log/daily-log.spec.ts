import fc from 'fast-check';
import { dailyLog } from './daily-log';
import { DailyLogEntry, LogSession } from './log-session';
import { expectProperty } from '../testing/expect-property';

const session = (startedAt: string, endedAt: string, activeMinutes: number, pages?: number): LogSession => ({
  startedAt,
  endedAt,
  activeMinutes,
  pages,
});

/** Rounds for comparison: the split is a float division. */
const rounded = (log: DailyLogEntry[]) => log.map((e) => ({ day: e.day, minutes: Math.round(e.minutes * 1e6) / 1e6, pages: Math.round(e.pages * 1e6) / 1e6 }));

describe('dailyLog', () => {
  it('puts a session inside one day on that day, and adds sessions of the same day', () => {
    const log = dailyLog(
      [
        session('2026-05-04T18:00:00.000Z', '2026-05-04T18:45:00.000Z', 40, 12),
        session('2026-05-04T07:00:00.000Z', '2026-05-04T07:20:00.000Z', 20, 5),
        session('2026-05-02T07:00:00.000Z', '2026-05-02T07:20:00.000Z', 15),
      ],
      'UTC',
    );
    // Hand-worked: 40 + 20 = 60 minutes and 12 + 5 = 17 pages on 4 May; sorted by day.
    expect(log).toEqual([
      { day: '2026-05-02', minutes: 15, pages: 0 },
      { day: '2026-05-04', minutes: 60, pages: 17 },
    ]);
  });

  // A session across the reader's local midnight splits in proportion to wall time; the same
  // instants fall on one day in the other zones. Offsets from the IANA tz database.
  const acrossMidnight = [
    {
      // Los Angeles is UTC−8 on 7–8 March 2026 before 02:00, so 07:30Z–08:30Z is 23:30–00:30 PST.
      // Hand-worked: 30 of the 60 wall minutes fall on each day → 30 min, 10 pages each. The same
      // instants are 07:30–08:30 UTC and 16:30–17:30 JST (UTC+9): one day each.
      zone: 'America/Los_Angeles',
      session: session('2026-03-08T07:30:00.000Z', '2026-03-08T08:30:00.000Z', 60, 20),
      split: [
        { day: '2026-03-07', minutes: 30, pages: 10 },
        { day: '2026-03-08', minutes: 30, pages: 10 },
      ],
      oneDay: { day: '2026-03-08', minutes: 60, pages: 20 },
      oneDayIn: ['UTC', 'Asia/Tokyo'],
    },
    {
      // Japan has kept UTC+9 without DST since 1951, so 14:30Z–15:30Z is 23:30–00:30 JST.
      // Hand-worked: active 40 of 60 wall minutes, spread evenly → 20 each day.
      zone: 'Asia/Tokyo',
      session: session('2026-03-07T14:30:00.000Z', '2026-03-07T15:30:00.000Z', 40),
      split: [
        { day: '2026-03-07', minutes: 20, pages: 0 },
        { day: '2026-03-08', minutes: 20, pages: 0 },
      ],
      oneDay: { day: '2026-03-07', minutes: 40, pages: 0 },
      oneDayIn: ['UTC', 'America/Los_Angeles'],
    },
  ];
  for (const { zone, session: across, split, oneDay, oneDayIn } of acrossMidnight) {
    it(`splits a session across midnight in ${zone} in proportion to time, and keeps it on one day in ${oneDayIn.join(' and ')}`, () => {
      expect(rounded(dailyLog([across], zone))).toEqual(split);
      for (const other of oneDayIn)
        expect(dailyLog([across], other))
          .withContext(other)
          .toEqual([oneDay]);
    });
  }

  it('knows 8 March 2026 has 23 hours in Los Angeles (US DST starts)', () => {
    // Energy Policy Act of 2005 §110 (15 U.S.C. 260a): DST starts at 02:00 on the second Sunday
    // of March, which in 2026 is 8 March. 08:00Z is 00:00 PST on 8 March; the next midnight is
    // 9 March 00:00 PDT = 07:00Z, 23 hours later. A 24-hour wall session from 08:00Z with 240
    // active minutes: hand-worked 240 × 23/24 = 230 on 8 March, 240 × 1/24 = 10 on 9 March.
    const s = session('2026-03-08T08:00:00.000Z', '2026-03-09T08:00:00.000Z', 240, 48);
    expect(rounded(dailyLog([s], 'America/Los_Angeles'))).toEqual([
      { day: '2026-03-08', minutes: 230, pages: 46 },
      { day: '2026-03-09', minutes: 10, pages: 2 },
    ]);
    // Same instants in UTC (16 h + 8 h) and Tokyo (00:00 JST 9 March = 15:00Z: 7 h + 17 h).
    expect(rounded(dailyLog([s], 'UTC'))).toEqual([
      { day: '2026-03-08', minutes: 160, pages: 32 },
      { day: '2026-03-09', minutes: 80, pages: 16 },
    ]);
    expect(rounded(dailyLog([s], 'Asia/Tokyo'))).toEqual([
      { day: '2026-03-08', minutes: 70, pages: 14 },
      { day: '2026-03-09', minutes: 170, pages: 34 },
    ]);
  });

  it('keeps a session through the skipped hour on one day', () => {
    // 09:30Z–10:30Z is 01:30 PST to 03:30 PDT on 8 March 2026 (EPAct 2005: clocks jump 02:00 → 03:00).
    const s = session('2026-03-08T09:30:00.000Z', '2026-03-08T10:30:00.000Z', 60);
    expect(dailyLog([s], 'America/Los_Angeles')).toEqual([{ day: '2026-03-08', minutes: 60, pages: 0 }]);
  });

  it('knows 1 November 2026 has 25 hours in Los Angeles (US DST ends)', () => {
    // Energy Policy Act of 2005 §110: DST ends at 02:00 on the first Sunday of November, which in
    // 2026 is 1 November. 07:00Z is 00:00 PDT on 1 November; the next midnight is 2 November
    // 00:00 PST = 08:00Z, 25 hours later. A 26-hour session from 07:00Z with 260 active minutes:
    // hand-worked 260 × 25/26 = 250 on 1 November, 10 on 2 November.
    const s = session('2026-11-01T07:00:00.000Z', '2026-11-02T09:00:00.000Z', 260);
    expect(rounded(dailyLog([s], 'America/Los_Angeles'))).toEqual([
      { day: '2026-11-01', minutes: 250, pages: 0 },
      { day: '2026-11-02', minutes: 10, pages: 0 },
    ]);
  });

  it('splits at midnight after the fall-back night too', () => {
    // 2 November 2026 00:00 PST = 08:00Z. 07:30Z–08:30Z is 23:30 PST 1 Nov to 00:30 PST 2 Nov.
    const s = session('2026-11-02T07:30:00.000Z', '2026-11-02T08:30:00.000Z', 30);
    expect(rounded(dailyLog([s], 'America/Los_Angeles'))).toEqual([
      { day: '2026-11-01', minutes: 15, pages: 0 },
      { day: '2026-11-02', minutes: 15, pages: 0 },
    ]);
  });

  it('puts a session with no wall time on the day it started, and drops empty days', () => {
    expect(
      dailyLog(
        [
          session('2026-06-01T12:00:00.000Z', '2026-06-01T12:00:00.000Z', 5, 2),
          session('2026-06-03T12:00:00.000Z', '2026-06-03T12:30:00.000Z', 0, 0),
          session('2026-06-04T12:00:00.000Z', '2026-06-04T12:30:00.000Z', 10, -3),
        ],
        'UTC',
      ),
    ).toEqual([
      { day: '2026-06-01', minutes: 5, pages: 2 },
      { day: '2026-06-04', minutes: 10, pages: 0 },
    ]);
  });

  it('throws on a bad zone or timestamp', () => {
    expect(() => dailyLog([], 'Atlantis/Capital')).toThrowError(RangeError);
    expect(() => dailyLog([session('soon', '2026-06-01T12:00:00.000Z', 5)], 'UTC')).toThrowError(RangeError);
  });

  // Zones with unusual rules: DST at midnight (Havana, Santiago), half-hour DST (Lord Howe),
  // +12:45 offsets (Chatham), half-hour offset without DST (Kolkata). IANA tz database.
  const zones = [
    'UTC',
    'America/Los_Angeles',
    'Asia/Tokyo',
    'Europe/London',
    'America/Havana',
    'America/Santiago',
    'Australia/Lord_Howe',
    'Pacific/Chatham',
    'Asia/Kolkata',
  ];
  const QUARTER_HOUR = 15 * 60_000;
  // Every offset and transition in these zones falls on a quarter hour, so sessions on quarter
  // hours can be checked exactly by stepping through them a quarter hour at a time.
  const quarterHourSession = fc
    .tuple(
      fc.integer({
        min: Date.parse('2024-01-01T00:00:00Z') / QUARTER_HOUR,
        max: Date.parse('2030-12-31T00:00:00Z') / QUARTER_HOUR,
      }),
      fc.integer({ min: 1, max: 4 * 24 * 3 }),
      fc.integer({ min: 0, max: 600 }),
      fc.integer({ min: 0, max: 200 }),
    )
    .map(([startQuarter, quarters, activeMinutes, pages]) =>
      session(new Date(startQuarter * QUARTER_HOUR).toISOString(), new Date((startQuarter + quarters) * QUARTER_HOUR).toISOString(), activeMinutes, pages),
    );

  /** UTC instants in 2026 where `zone` changes its offset, found by an hourly walk with Intl. */
  const transitions2026 = (zone: string): number[] => {
    const wall = new Intl.DateTimeFormat('en-US', {
      timeZone: zone,
      hourCycle: 'h23',
      year: 'numeric',
      month: 'numeric',
      day: 'numeric',
      hour: 'numeric',
      minute: 'numeric',
    });
    const offset = (ms: number) => {
      const p = Object.fromEntries(wall.formatToParts(ms).map((x) => [x.type, Number(x.value)]));
      return Date.UTC(p['year'], p['month'] - 1, p['day'], p['hour'], p['minute']) - ms;
    };
    const found: number[] = [];
    const HOUR = 3_600_000;
    for (let t = Date.parse('2026-01-01T00:00:00Z'); t < Date.parse('2027-01-01T00:00:00Z'); t += HOUR) {
      if (offset(t) !== offset(t + HOUR)) found.push(t);
    }
    return found;
  };
  const nearTransition = fc.constantFrom(...zones.flatMap((zone) => transitions2026(zone).map((t) => ({ zone, t })))).chain(({ zone, t }) =>
    fc
      // From 36 h before to 2 h after the switch, up to 72 h long.
      .tuple(fc.integer({ min: -4 * 36, max: 4 * 2 }), fc.integer({ min: 1, max: 4 * 72 }), fc.integer({ min: 1, max: 600 }))
      .map(([fromQuarter, quarters, activeMinutes]) => {
        const start = Math.floor(t / QUARTER_HOUR) * QUARTER_HOUR + fromQuarter * QUARTER_HOUR;
        const end = start + quarters * QUARTER_HOUR;
        return { zone, s: session(new Date(start).toISOString(), new Date(end).toISOString(), activeMinutes) };
      }),
  );

  it('finds the 2026 transitions it will test around (tz database sanity check)', () => {
    // EPAct 2005: Los Angeles switches on 8 March 10:00Z (02:00 PST) and 1 November 09:00Z (02:00 PDT);
    // the walk reports the hour before each switch. Tokyo and UTC never switch.
    expect(transitions2026('America/Los_Angeles').map((t) => new Date(t).toISOString())).toEqual(['2026-03-08T09:00:00.000Z', '2026-11-01T08:00:00.000Z']);
    expect(transitions2026('Asia/Tokyo')).toEqual([]);
    expect(transitions2026('UTC')).toEqual([]);
  });

  it('keeps every minute and page (property)', () => {
    expectProperty(
      fc.property(fc.array(quarterHourSession, { maxLength: 8 }), fc.constantFrom(...zones), (sessions, zone) => {
        const log = dailyLog(sessions, zone);
        const sum = (xs: number[]) => xs.reduce((a, b) => a + b, 0);
        const days = log.map((e) => e.day);
        return (
          Math.abs(sum(log.map((e) => e.minutes)) - sum(sessions.map((s) => s.activeMinutes))) < 1e-6 &&
          Math.abs(sum(log.map((e) => e.pages)) - sum(sessions.map((s) => s.pages ?? 0))) < 1e-6 &&
          days.join() === [...new Set(days)].sort().join()
        );
      }),
      { numRuns: 200 },
    );
  });

  const anySession = fc.oneof(fc.record({ zone: fc.constantFrom(...zones), s: quarterHourSession }), nearTransition);

  it('matches a quarter-hour walk with Intl.DateTimeFormat (ECMA-402 reference) in odd zones (property)', () => {
    expectProperty(
      fc.property(anySession, ({ zone, s }) => {
        fc.pre(s.activeMinutes > 0);
        const parts = new Intl.DateTimeFormat('en-US', { timeZone: zone, year: 'numeric', month: '2-digit', day: '2-digit' });
        const dayOf = (ms: number) => {
          const p = Object.fromEntries(parts.formatToParts(ms).map((x) => [x.type, x.value]));
          return `${p['year']}-${p['month']}-${p['day']}`;
        };
        const start = Date.parse(s.startedAt);
        const end = Date.parse(s.endedAt);
        const quartersByDay = new Map<string, number>();
        for (let t = start; t < end; t += QUARTER_HOUR) quartersByDay.set(dayOf(t), (quartersByDay.get(dayOf(t)) ?? 0) + 1);
        const total = (end - start) / QUARTER_HOUR;
        const expected = [...quartersByDay].map(([day, q]) => ({ day, minutes: (s.activeMinutes * q) / total }));
        const actual = dailyLog([s], zone).map((e) => ({ day: e.day, minutes: e.minutes }));
        return actual.map((e) => e.day).join() === expected.map((e) => e.day).join() && actual.every((e, i) => Math.abs(e.minutes - expected[i].minutes) < 1e-6);
      }),
      { numRuns: 400 },
    );
  });
});
