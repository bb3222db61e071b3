import { getISODay, getWeekOfMonth } from 'date-fns';

import { yearHeatmapLayout } from './year-heatmap-layout';

describe('yearHeatmapLayout', () => {
  it('puts each day under its weekday, Monday first, in its month’s week row, as date-fns (a reference library) counts them', () => {
    for (const year of [2024, 2026, 2027, 2028]) {
      const { months } = yearHeatmapLayout([], year);
      expect(months.length).toBe(12);
      for (const month of months) {
        for (const cell of month.cells) {
          const date = new Date(`${cell.day}T12:00:00`);
          expect(cell.column).withContext(cell.day).toBe(getISODay(date));
          expect(cell.week)
            .withContext(cell.day)
            .toBe(getWeekOfMonth(date, { weekStartsOn: 1 }));
        }
      }
    }
  });

  it('starts January 2026 on a Thursday and gives February of a leap year 29 days', () => {
    expect(yearHeatmapLayout([], 2026).months[0]).toEqual(jasmine.objectContaining({ name: 'January', leading: 3 }));
    expect(yearHeatmapLayout([], 2028).months[1]!.cells.length).toBe(29);
    expect(yearHeatmapLayout([], 2028).cells.length).toBe(366);
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
    expect(layout.months[0]).toEqual(jasmine.objectContaining({ name: 'January', days: 2, minutes: 90 }));
    expect(layout.months[2]).toEqual(jasmine.objectContaining({ name: 'March', days: 1, minutes: 45 }));
  });

  it('names the month calendars in the reader’s locale (Unicode CLDR: janvier, März)', () => {
    expect(yearHeatmapLayout([], 2026, 'fr-FR').months[0]!.name).toBe('janvier');
    expect(yearHeatmapLayout([], 2026, 'de-DE').months[2]!.name).toBe('März');
  });
});
