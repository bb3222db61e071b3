import { monthHeatmap } from './month-heatmap-cells';

describe('monthHeatmap', () => {
  it('starts each month under its weekday, Monday first', () => {
    // Hand, from 1 January 2026 being a Thursday (WHATWG HTML's week example; Python
    // date(2026, 1, 1).isoweekday() == 4): 1 June is 151 days on, 151 mod 7 = 4 → Monday;
    // 1 March is 59 days on, 59 mod 7 = 3 → Sunday.
    expect(monthHeatmap('2026-06', []).leading).toBe(0);
    expect(monthHeatmap('2026-03', []).leading).toBe(6);
  });

  it('has a cell for every day, leap days included', () => {
    // Gregorian rule (RFC 3339 Appendix C): 2028 is a leap year, 2026 is not.
    expect(monthHeatmap('2028-02', []).days.length).toBe(29);
    expect(monthHeatmap('2026-02', []).days.length).toBe(28);
  });

  it('adds up the month and finds its fullest day, leaving other months out', () => {
    const heatmap = monthHeatmap('2026-06', [
      { day: '2026-05-31', minutes: 500, pages: 100 },
      { day: '2026-06-02', minutes: 15, pages: 0 },
      { day: '2026-06-20', minutes: 80, pages: 30 },
      { day: '2026-06-21', minutes: 80, pages: 2 },
      { day: '2026-07-01', minutes: 500, pages: 100 },
    ]);
    expect([heatmap.readingDays, heatmap.minutes, heatmap.pages]).toEqual([3, 175, 32]);
    // The earliest of equal days.
    expect(heatmap.busiest?.day).toBe('2026-06-20');
    expect(heatmap.days[19]).toEqual({ day: '2026-06-20', date: 20, minutes: 80, pages: 30, level: 4 });
  });

  it('has no fullest day without reading', () => {
    expect(monthHeatmap('2026-06', []).busiest).toBeNull();
  });

  it('refuses what is not a month', () => {
    expect(() => monthHeatmap('2026-13', [])).toThrowError(RangeError);
  });
});
