import { ChallengeBook } from './challenge-book';
import { weeklyChallengeProgress } from './weekly-challenge-progress';
import { inventedBook as finished } from './testing/invented-book';

describe('weeklyChallengeProgress', () => {
  it('has 53 weeks in 2026, from Monday 2025-12-29 to Sunday 2027-01-03', () => {
    // WHATWG HTML "week number of the last day": 1 January 2026 is a Thursday → 53 weeks.
    // Python date.isocalendar(), run while writing: 2025-12-29 → (2026, 1, 1), 2027-01-03 → (2026, 53, 7).
    const progress = weeklyChallengeProgress({ year: 2026, books: [], today: '2026-01-01' });
    expect(progress.weeks.length).toBe(53);
    expect(progress.target).toBe(53);
    expect(progress.period).toEqual({ start: '2025-12-29', end: '2027-01-03' });
  });

  it('has 52 weeks in 2027', () => {
    // WHATWG HTML week rule: 1 January 2027 is a Friday → 52 weeks.
    expect(weeklyChallengeProgress({ year: 2027, books: [], today: '2027-01-01' }).weeks.length).toBe(52);
  });

  it('counts books on the ISO-year boundary in the ISO week they fall in', () => {
    // Python date.isocalendar(), run while writing: 2027-01-01 → (2026, 53, 5),
    // 2025-12-29 → (2026, 1, 1); 2025-12-28 is in 2025-W52 and 2027-01-04 in 2027-W01.
    const books = [finished('new-year', '2027-01-01'), finished('early', '2025-12-29'), finished('too-early', '2025-12-28'), finished('too-late', '2027-01-04')];
    const progress = weeklyChallengeProgress({ year: 2026, books, today: '2027-01-10' });
    expect(progress.weeks[52]).toEqual(jasmine.objectContaining({ week: 53, bookIds: ['new-year'], state: 'met' }));
    expect(progress.weeks[0]).toEqual(jasmine.objectContaining({ week: 1, bookIds: ['early'], state: 'met' }));
    expect(progress.counted).toEqual(['early', 'new-year']);
    expect(progress.done).toBe(2);
  });

  it('marks weeks met, missed or upcoming relative to today', () => {
    // Python date.isocalendar(), run while writing: 2026-03-03 → (2026, 10, 2), 2026-03-04 → (2026, 10, 3),
    // 2026-01-14 → (2026, 3, 3). Rule (ours): a week still in progress stays "upcoming" until met or over.
    const books = [finished('w3', '2026-01-14')];
    const before = weeklyChallengeProgress({ year: 2026, books, today: '2026-03-04' });
    expect(before.weeks.map((week) => week.state).slice(0, 11)).toEqual([
      'missed',
      'missed',
      'met',
      'missed',
      'missed',
      'missed',
      'missed',
      'missed',
      'missed',
      'upcoming',
      'upcoming',
    ]);
    const after = weeklyChallengeProgress({ year: 2026, books: [...books, finished('w10', '2026-03-03')], today: '2026-03-04' });
    expect(after.weeks[9]).toEqual(jasmine.objectContaining({ week: 10, monday: '2026-03-02', state: 'met', bookIds: ['w10'] }));
    // A week is missed only once its Sunday has passed: Sunday 2026-03-08 is still W10.
    expect(weeklyChallengeProgress({ year: 2026, books: [], today: '2026-03-08' }).weeks[9].state).toBe('upcoming');
    expect(weeklyChallengeProgress({ year: 2026, books: [], today: '2026-03-09' }).weeks[9].state).toBe('missed');
  });

  it('lists every book of a busy week, and counts the week once', () => {
    const progress = weeklyChallengeProgress({ year: 2026, books: [finished('b', '2026-03-05'), finished('a', '2026-03-03')], today: '2026-12-31' });
    expect(progress.weeks[9].bookIds).toEqual(['a', 'b']);
    expect(progress.done).toBe(1);
  });

  it('ignores books that are not finished', () => {
    const reading: ChallengeBook = { id: 'r', title: 'Half-Read Harbour', authors: ['Lio Penhallow'], status: 'reading', finishedOn: '2026-03-03' };
    expect(weeklyChallengeProgress({ year: 2026, books: [reading], today: '2026-03-04' }).done).toBe(0);
  });
});
