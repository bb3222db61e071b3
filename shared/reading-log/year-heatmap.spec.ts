import { eachDayOfInterval, format } from 'date-fns';
import { tz } from '@date-fns/tz';
import { dailyLog } from './daily-log';
import { HEATMAP_THRESHOLDS, yearHeatmap } from './year-heatmap';

describe('yearHeatmap', () => {
  it('has 366 cells in the leap year 2028 and 365 in 2026 (Gregorian calendar)', () => {
    // Gregorian rule (ISO 8601 calendar): divisible by 4 is leap, except centuries not divisible by 400.
    expect(yearHeatmap([], 2028).length).toBe(366);
    expect(yearHeatmap([], 2026).length).toBe(365);
    expect(yearHeatmap([], 2100).length).toBe(365);
    expect(yearHeatmap([], 2000).length).toBe(366);
  });

  it('lists every day of 2028 in order, as date-fns eachDayOfInterval (npm reference) does', () => {
    const utc = tz('UTC');
    const expected = eachDayOfInterval({ start: new Date('2028-01-01T00:00:00Z'), end: new Date('2028-12-31T00:00:00Z') }, { in: utc }).map((d) =>
      format(d, 'yyyy-MM-dd', { in: utc }),
    );
    const cells = yearHeatmap([], 2028);
    expect(cells.map((c) => c.day)).toEqual(expected);
    // Day 60 of a leap year is 29 February (31 + 29).
    expect(cells[59].day).toBe('2028-02-29');
  });

  it('levels minutes by the fixed thresholds 0 / >0 / 15 / 30 / 60', () => {
    // [minutes read on a day, its level], one day each from 1 January; 8 January reads nothing.
    const levels = [
      [0.5, 1],
      [14.9, 1],
      [15, 2],
      [30, 3],
      [59, 3],
      [60, 4],
      [600, 4],
    ] as const;
    const cells = yearHeatmap(
      levels.map(([minutes], n) => ({ day: `2026-01-0${n + 1}`, minutes, pages: 0 })),
      2026,
    );
    expect(cells.slice(0, 8).map((c) => c.level)).toEqual([...levels.map(([, level]) => level), 0]);
    expect(HEATMAP_THRESHOLDS.slice(1)).toEqual([15, 30, 60]);
  });

  it('adds entries for the same day and ignores other years', () => {
    const cells = yearHeatmap(
      [
        { day: '2026-05-04', minutes: 10, pages: 1 },
        { day: '2026-05-04', minutes: 10, pages: 1 },
        { day: '2025-05-04', minutes: 90, pages: 9 },
        { day: '2027-01-01', minutes: 90, pages: 9 },
      ],
      2026,
    );
    expect(cells.find((c) => c.day === '2026-05-04')).toEqual({ day: '2026-05-04', minutes: 20, level: 2 });
    expect(cells.reduce((sum, c) => sum + c.minutes, 0)).toBe(20);
  });

  it('accepts other thresholds', () => {
    const cells = yearHeatmap([{ day: '2026-01-01', minutes: 20, pages: 0 }], 2026, [5, 10, 20, 40]);
    expect(cells[0].level).toBe(3);
  });

  it('places New Year’s Eve reading on the reader’s own day (Tokyo vs Los Angeles)', () => {
    // 2028-12-31T15:30Z is 00:30 JST on 1 January 2029 and 07:30 PST on 31 December 2028.
    const sessions = [{ startedAt: '2028-12-31T15:30:00Z', endedAt: '2028-12-31T16:30:00Z', activeMinutes: 60 }];
    expect(yearHeatmap(dailyLog(sessions, 'Asia/Tokyo'), 2028)[365].level).toBe(0);
    const losAngeles = yearHeatmap(dailyLog(sessions, 'America/Los_Angeles'), 2028);
    expect(losAngeles[365]).toEqual({ day: '2028-12-31', minutes: 60, level: 4 });
    expect(yearHeatmap(dailyLog(sessions, 'Asia/Tokyo'), 2029)[0]).toEqual({ day: '2029-01-01', minutes: 60, level: 4 });
  });

  it('refuses a year that is not a whole number 0000–9999', () => {
    expect(() => yearHeatmap([], 2026.5)).toThrowError(RangeError);
    expect(() => yearHeatmap([], 10000)).toThrowError(RangeError);
  });
});
