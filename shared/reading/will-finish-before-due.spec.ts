import fc from 'fast-check';
import { dayFromIndex } from '../reading-log/day-from-index';
import { dayIndex } from '../reading-log/day-index';
import { fallbackPace } from './fallback-pace';
import { DueForecastInput, willFinishBeforeDue } from './will-finish-before-due';
import { expectProperty } from '../testing/expect-property';
import { BRIEF_EXAMPLE } from './testing/brief-example';

/** 300 pages at 30 pages/hour (600 minutes), 45 minutes a day, from 1 March 2026, due 14 March. */
const due = (changes: Partial<DueForecastInput> = {}) =>
  willFinishBeforeDue({
    ...BRIEF_EXAMPLE,
    timeZone: 'UTC',
    dueDate: '2026-03-14',
    ...changes,
  });

describe('willFinishBeforeDue', () => {
  it('finishes on the due date exactly: 600 minutes, 45 a day, due 14 March', () => {
    // Hand-worked: 14 days (1–14 March) → finish 14 March, margin 0; needed 600 / 14 = 42.86.
    const result = due();
    expect(result).toEqual(jasmine.objectContaining({ likely: true, finishDate: '2026-03-14', dueDate: '2026-03-14', marginDays: 0 }));
    expect(result.minutesPerDayNeeded).toBeCloseTo(600 / 14, 9);
  });

  it('is a day late when due 13 March, and says what would do it', () => {
    // 13 days available: 600 / 13 = 46.15 minutes a day, more than the usual 45.
    const result = due({ dueDate: '2026-03-13' });
    expect(result.likely).toBeFalse();
    expect(result.marginDays).toBe(-1);
    expect(result.minutesPerDayNeeded).toBeCloseTo(600 / 13, 9);
  });

  it('checks a three-week library loan of a 400-page novel at Brysbaert’s fiction rate', () => {
    // A 21-day loan is usual at public libraries (common practice, from memory): borrowed
    // 1 March, due 22 March. Brysbaert 2019 fiction 260 wpm at 275 words/page (common practice):
    // 400 × 275 / 260 = 423.1 minutes; 30 a day → 14.1 → 15 days → 15 March, 7 days to spare;
    // needed 423.1 / 22 = 19.2 a day.
    const result = due({
      remaining: 400,
      pace: fallbackPace({ format: 'print', genre: 'fiction' }),
      minutesPerDay: 30,
      timeZone: 'America/Los_Angeles',
      dueDate: '2026-03-22',
    });
    expect(result.likely).toBeTrue();
    expect(result.finishDate).toBe('2026-03-15');
    expect(result.marginDays).toBe(7);
    expect(result.minutesPerDayNeeded).toBeCloseTo((400 * 275) / 260 / 22, 9);
  });

  it('cannot say when without reading time, and needs no minutes with nothing left', () => {
    const idle = due({ minutesPerDay: 0 });
    expect(idle).toEqual(jasmine.objectContaining({ likely: false, finishDate: null, marginDays: null }));
    expect(idle.minutesPerDayNeeded).toBeCloseTo(600 / 14, 9);
    expect(due({ remaining: 0 })).toEqual(jasmine.objectContaining({ likely: true, finishDate: '2026-03-01', marginDays: 13, minutesPerDayNeeded: 0 }));
  });

  it('has no minutes a day that can help once the due date has passed', () => {
    expect(due({ dueDate: '2026-02-27' })).toEqual(jasmine.objectContaining({ likely: false, minutesPerDayNeeded: null, marginDays: -15 }));
  });

  it('is likely exactly when the usual minutes reach the minutes needed (property)', () => {
    expectProperty(
      fc.property(
        fc.integer({ min: 1, max: 2000 }),
        fc.integer({ min: 1, max: 120 }),
        fc.integer({ min: 1, max: 300 }),
        fc.integer({ min: 0, max: 120 }),
        fc.constantFrom('UTC', 'America/Los_Angeles', 'Asia/Tokyo'),
        (remaining, rate, minutesPerDay, daysAhead, timeZone) => {
          const dueDate = dayFromIndex(dayIndex('2026-03-01') + daysAhead);
          const result = due({ remaining, pace: { format: 'print', rate }, minutesPerDay, timeZone, dueDate });
          const needed = result.minutesPerDayNeeded!;
          if (minutesPerDay >= needed * (1 + 1e-9) && !result.likely) return false;
          if (minutesPerDay <= needed * (1 - 1e-9) && result.likely) return false;
          return result.likely === result.marginDays! >= 0;
        },
      ),
      { numRuns: 300 },
    );
  });
});
