import { comingOut } from './coming-out';

describe('comingOut', () => {
  it('puts the next seven days first, soonest first, later after, and leaves past ones out', () => {
    const books = [
      { id: 'later', releaseDate: '2026-03-10' },
      { id: 'past', releaseDate: '2026-03-02' },
      { id: 'week-end', releaseDate: '2026-03-09' },
      { id: 'today', releaseDate: '2026-03-03' },
      { id: 'none', releaseDate: null },
    ];
    const { thisWeek, later } = comingOut(books, '2026-03-03');
    // 3 March + 6 days = 9 March is the last day of "this week" (seven days, today included).
    expect(thisWeek.map((b) => b.id)).toEqual(['today', 'week-end']);
    expect(later.map((b) => b.id)).toEqual(['later']);
  });
});
