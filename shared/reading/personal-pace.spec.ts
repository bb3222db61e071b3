import fc from 'fast-check';
import { PaceSession, ReadingFormat } from './pace-session';
import { personalPace } from './personal-pace';
import { expectProperty } from '../testing/expect-property';

/** A session on day `day` of March 2026 at 20:00Z, with `minutes` active and `progress` made. */
const on = (day: number, minutes: number, progress: number, format: ReadingFormat = 'print', from = 0): PaceSession => {
  const start = Date.UTC(2026, 2, day, 20);
  return {
    format,
    startedAt: new Date(start).toISOString(),
    endedAt: new Date(start + Math.max(minutes, 1) * 60_000).toISOString(),
    activeMinutes: minutes,
    fromPosition: from,
    toPosition: from + progress,
  };
};

describe('personalPace', () => {
  it('is the median of the per-session rates (hand-worked)', () => {
    // 30 pages in 60 min = 30 p/h; 20 in 30 min = 40 p/h; 25 in 60 min = 25 p/h → median 30.
    expect(personalPace([on(1, 60, 30), on(2, 30, 20), on(3, 60, 25)], 'print')).toEqual({ format: 'print', rate: 30 });
  });

  it('takes the mean of the two middle rates for an even count', () => {
    // Median of an even sample is the mean of the two middle values (NIST/SEMATECH e-Handbook of
    // Statistics §1.3.5.1, from memory): 20, 30, 40, 50 p/h → 35.
    expect(personalPace([on(1, 60, 20), on(2, 60, 30), on(3, 60, 40), on(4, 60, 50)], 'print')?.rate).toBe(35);
  });

  it('gives ebook pace in percent per hour and audiobook pace in listened minutes per real minute', () => {
    // 5 % in 30 min = 10 %/h; 6 % in 30 = 12; 4 % in 30 = 8 → 10.
    expect(personalPace([on(1, 30, 5, 'ebook'), on(2, 30, 6, 'ebook'), on(3, 30, 4, 'ebook')], 'ebook')?.rate).toBe(10);
    // 45 listened minutes in 30 real minutes is 1.5× playback; 60 in 60 is 1×; 40 in 20 is 2× → 1.5.
    const audio = [on(1, 30, 45, 'audiobook'), on(2, 60, 60, 'audiobook'), on(3, 20, 40, 'audiobook')];
    expect(personalPace(audio, 'audiobook')?.rate).toBe(1.5);
  });

  it('skips other formats and sessions without minutes or forward progress', () => {
    const sessions = [
      on(1, 60, 30),
      on(2, 60, 30),
      on(3, 0, 30), // no minutes
      on(4, 60, -10, 'print', 50), // went back
      on(5, 60, 0), // position not updated
      on(6, 60, 300, 'ebook'),
      { ...on(7, 60, 600), endedAt: 'not a time' },
    ];
    // Only two usable print sessions: fewer than the default minimum of 3.
    expect(personalPace(sessions, 'print')).toBeNull();
    expect(personalPace(sessions, 'print', { minimum: 2 })?.rate).toBe(30);
  });

  it('uses only the most recent sessions by end time', () => {
    // Ten old sessions at 10 p/h, then three at 40 p/h; with recent = 3 only the fast ones count.
    const old = Array.from({ length: 10 }, (_, i) => on(i + 1, 60, 10));
    const recent = [on(20, 60, 40), on(21, 60, 40), on(22, 60, 40)];
    expect(personalPace([...recent, ...old], 'print', { recent: 3 })?.rate).toBe(40);
    // Default 10: three fast and seven slow → median 10.
    expect(personalPace([...recent, ...old], 'print')?.rate).toBe(10);
  });

  it('is null with no history, and rejects nonsense options', () => {
    expect(personalPace([], 'print')).toBeNull();
    expect(() => personalPace([], 'print', { recent: 0 })).toThrowError(RangeError);
  });

  const session = fc
    .tuple(fc.integer({ min: 1, max: 28 }), fc.integer({ min: 1, max: 180 }), fc.integer({ min: 1, max: 120 }))
    .map(([day, minutes, pages]) => on(day, minutes, pages));

  it('does not depend on the order of sessions, even with ties at the cut-off (property)', () => {
    // Few days and two lengths make sessions that end at the same instant common, so the
    // choice of the 10 most recent must not fall back on input order.
    const tying = fc
      .tuple(fc.integer({ min: 1, max: 4 }), fc.constantFrom(30, 60), fc.integer({ min: 1, max: 120 }))
      .map(([day, minutes, pages]) => on(day, minutes, pages));
    expectProperty(
      fc.property(
        fc
          .array(fc.oneof(session, tying), { minLength: 3, maxLength: 25 })
          .chain((sessions) => fc.tuple(fc.constant(sessions), fc.shuffledSubarray(sessions, { minLength: sessions.length, maxLength: sessions.length }))),
        ([sessions, shuffled]) => {
          const rate = personalPace(sessions, 'print')?.rate;
          const reversed = [...sessions].reverse();
          return personalPace(shuffled, 'print')?.rate === rate && personalPace(reversed, 'print')?.rate === rate;
        },
      ),
    );
  });

  it('is not moved by one outlier beyond the range of the other sessions (property)', () => {
    // Median breakdown point (a standard robust-statistics result): one extreme value among
    // three or more cannot take the median outside the range of the rest.
    expectProperty(
      fc.property(fc.array(session, { minLength: 2, maxLength: 9 }), fc.constantFrom(0.001, 1000), (others, factor) => {
        const rates = others.map((s) => ((s.toPosition - s.fromPosition) * 60) / s.activeMinutes);
        const outlier = { ...on(28, 60, 1), toPosition: 60 * factor };
        const pace = personalPace([...others, outlier], 'print', { recent: 10 });
        return pace !== null && pace.rate >= Math.min(...rates) - 1e-9 && pace.rate <= Math.max(...rates) + 1e-9;
      }),
    );
  });

  it('scales with the reading: twice the pages in the same time is twice the pace (property)', () => {
    expectProperty(
      fc.property(fc.array(session, { minLength: 3, maxLength: 12 }), (sessions) => {
        const doubled = sessions.map((s) => ({ ...s, toPosition: s.fromPosition + 2 * (s.toPosition - s.fromPosition) }));
        return Math.abs(personalPace(doubled, 'print')!.rate - 2 * personalPace(sessions, 'print')!.rate) < 1e-9;
      }),
    );
  });
});
