import { differenceInCalendarWeeks, getISODay } from 'date-fns';

import { yearHeatmapLayout } from './year-heatmap-layout';

describe('yearHeatmapLayout', () => {
  it('puts each day in its weekday row, Monday first, as date-fns (a reference library) counts ISO weekdays', () => {
    for (const year of [2024, 2026, 2027, 2028]) {
      const { cells } = yearHeatmapLayout([], year);
      for (const cell of cells) {
        const date = new Date(`${cell.day}T12:00:00`);
        expect(cell.row).withContext(cell.day).toBe(getISODay(date));
        expect(cell.column)
          .withContext(cell.day)
          .toBe(differenceInCalendarWeeks(date, new Date(`${year}-01-01T12:00:00`), { weekStartsOn: 1 }) + 1);
      }
    }
  });

  it('starts 2026 on a Thursday and spans 53 columns (ISO 8601: 2026 has 53 weeks)', () => {
    const layout = yearHeatmapLayout([], 2026);
    expect(layout.cells[0]).toEqual(jasmine.objectContaining({ day: '2026-01-01', row: 4, column: 1 }));
    expect(layout.columns).toBe(53);
    expect(layout.months[1]).toEqual({ name: 'Feb', column: 5 });
  });

  it('totals the months and finds the fullest day (worked by hand)', () => {
    const layout = yearHeatmapLayout(
      [
        { day: '2026-01-10', minutes: 60, pages: 40 },
        { day: '2026-01-11', minutes: 30, pages: 20 },
        { day: '2026-03-18', minutes: 45, pages: 45 },
        { day: '2025-12-31', minutes: 500, pages: 0 },
      ],
      2026,
    );
    expect(layout.readingDays).toBe(3);
    expect(layout.minutes).toBe(135);
    expect(layout.fullest?.day).toBe('2026-01-10');
    expect(layout.totals[0]).toEqual({ name: 'January', days: 2, minutes: 90 });
    expect(layout.totals[2]).toEqual({ name: 'March', days: 1, minutes: 45 });
  });
});
