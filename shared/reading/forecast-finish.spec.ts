import fc from 'fast-check';
import { fallbackPace } from './fallback-pace';
import { ForecastInput, forecastFinish } from './forecast-finish';
import { expectProperty } from '../testing/expect-property';
import { BRIEF_EXAMPLE } from './testing/brief-example';

/** 300 pages at 30 pages/hour, 45 minutes a day, from 1 March 2026; override what a case needs. */
const forecast = (changes: Partial<ForecastInput> = {}) =>
  forecastFinish({
    ...BRIEF_EXAMPLE,
    timeZone: 'America/Los_Angeles',
    ...changes,
  });

describe('forecastFinish', () => {
  it('works the brief’s example: 300 pages at 30 pages/hour, 45 minutes a day', () => {
    // Hand-worked: 300 / 30 = 10 h = 600 min; 600 / 45 = 13.33 → 14 days; today (1 March) is
    // day 1, so day 14 is 14 March.
    expect(forecast()).toEqual({ minutesLeft: 600, daysLeft: 14, finishDate: '2026-03-14' });
  });

  it('forecasts a first book from Brysbaert’s rate', () => {
    // Brysbaert 2019: 238 wpm (non-fiction); 275 words a page (common practice). 300 pages =
    // 82,500 words = 346.6 minutes; at 30 minutes a day 11.55 → 12 days: 1 → 12 March.
    const result = forecast({ pace: fallbackPace({ format: 'print' }), minutesPerDay: 30 });
    expect(result.minutesLeft).toBeCloseTo(82_500 / 238, 9);
    expect(result.daysLeft).toBe(12);
    expect(result.finishDate).toBe('2026-03-12');
  });

  it('forecasts an audiobook at 1.5× and an ebook that divides exactly', () => {
    // 600 listened minutes at 1.5× = 400 real minutes; 60 a day → 6.67 → 7 days.
    const audio = forecast({ remaining: 600, pace: { format: 'audiobook', rate: 1.5 }, minutesPerDay: 60 });
    expect(audio).toEqual({ minutesLeft: 400, daysLeft: 7, finishDate: '2026-03-07' });
    // 60 % at 15 %/hour = 240 minutes; 40 a day = exactly 6 days, no extra day.
    expect(forecast({ remaining: 60, pace: { format: 'ebook', rate: 15 }, minutesPerDay: 40 }).daysLeft).toBe(6);
  });

  it('does not add a day for float error', () => {
    // 600 / (600 / 14) is 14 in exact arithmetic, 14.000000000000002 in floats.
    expect(forecast({ minutesPerDay: 600 / 14 }).daysLeft).toBe(14);
  });

  it('takes today for a sliver of reading left, never yesterday', () => {
    expect(forecast({ remaining: 1e-12 })).toEqual(jasmine.objectContaining({ daysLeft: 1, finishDate: '2026-03-01' }));
  });

  it('gives the same calendar day in every zone, over the DST switch and the 2028 leap day', () => {
    const fiveDays = { remaining: 100, pace: { format: 'print' as const, rate: 60 }, minutesPerDay: 20 }; // 100 min
    for (const timeZone of ['UTC', 'America/Los_Angeles', 'Asia/Tokyo']) {
      // EPAct 2005: US DST starts 8 March 2026; 5 days from 5 March are 5–9 March.
      expect(forecast({ ...fiveDays, today: '2026-03-05', timeZone }).finishDate).toBe('2026-03-09');
      // EPAct 2005: US DST ends 1 November 2026.
      expect(forecast({ ...fiveDays, today: '2026-10-30', timeZone }).finishDate).toBe('2026-11-03');
      // Gregorian calendar: 2028 has a 29 February.
      expect(forecast({ ...fiveDays, today: '2028-02-25', timeZone }).finishDate).toBe('2028-02-29');
    }
  });

  it('cannot foresee a finish without reading time, and has finished with nothing left', () => {
    expect(forecast({ remaining: 50, minutesPerDay: 0 })).toEqual({ minutesLeft: 100, daysLeft: null, finishDate: null });
    expect(forecast({ remaining: 0, minutesPerDay: 0 })).toEqual({ minutesLeft: 0, daysLeft: 0, finishDate: '2026-03-01' });
  });

  it('refuses an unknown zone or a malformed day', () => {
    expect(() => forecast({ timeZone: 'Moon/Tranquility' })).toThrowError(RangeError);
    expect(() => forecast({ today: '1 March 2026' })).toThrowError(RangeError);
  });

  it('finishes no earlier with more left, and no later with more minutes a day (property)', () => {
    const amount = fc.double({ min: 0, max: 2000, noNaN: true });
    const minutes = fc.double({ min: 1, max: 600, noNaN: true });
    expectProperty(
      fc.property(amount, amount, fc.double({ min: 1, max: 120, noNaN: true }), minutes, minutes, (a, b, rate, m1, m2) => {
        const pace = { format: 'print' as const, rate };
        const [less, more] = a <= b ? [a, b] : [b, a];
        const [slow, fast] = m1 <= m2 ? [m1, m2] : [m2, m1];
        const fewer = forecast({ pace, remaining: less, minutesPerDay: slow });
        const bigger = forecast({ pace, remaining: more, minutesPerDay: slow });
        const quicker = forecast({ pace, remaining: more, minutesPerDay: fast });
        return (
          bigger.minutesLeft >= fewer.minutesLeft &&
          bigger.daysLeft! >= fewer.daysLeft! &&
          bigger.finishDate! >= fewer.finishDate! &&
          fewer.finishDate! >= '2026-03-01' &&
          quicker.daysLeft! <= bigger.daysLeft!
        );
      }),
    );
  });
});
