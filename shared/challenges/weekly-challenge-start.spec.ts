import { format, startOfISOWeek, setISOWeek, setISOWeekYear } from 'date-fns';

import { weeklyChallengeProgress } from './weekly-challenge-progress';
import { weeklyChallengeStart } from './weekly-challenge-start';

/** The Monday of an ISO 8601 week, computed by date-fns (our reference, outside the project). */
const mondayOf = (day: string) => format(startOfISOWeek(new Date(`${day}T12:00:00`)), 'yyyy-MM-dd');
const mondayOfWeek = (year: number, week: number) => format(startOfISOWeek(setISOWeek(setISOWeekYear(new Date(2000, 5, 15), year), week)), 'yyyy-MM-dd');

describe('weeklyChallengeStart', () => {
  it('starts this week by default, on the Monday of the ISO week holding today', () => {
    // Friday 4 December 2026 is in ISO week 2026-W49 (date-fns startOfISOWeek → Monday 30 November).
    expect(weeklyChallengeStart({ year: 2026, today: '2026-12-04', from: 'this-week' })).toBe(mondayOf('2026-12-04'));
    expect(mondayOf('2026-12-04')).toBe('2026-11-30');
    // A Sunday belongs to the week of the Monday before it (ISO 8601 §3.2.2 weeks start on Monday).
    expect(weeklyChallengeStart({ year: 2026, today: '2026-03-08', from: 'this-week' })).toBe(mondayOf('2026-03-08'));
  });

  it('starts the whole year on the Monday of week 1, which can fall in December', () => {
    expect(weeklyChallengeStart({ year: 2026, today: '2026-12-04', from: 'whole-year' })).toBe(mondayOfWeek(2026, 1));
    expect(mondayOfWeek(2026, 1)).toBe('2025-12-29');
  });

  it('starts a later year at its week 1 and a past year at its last week', () => {
    expect(weeklyChallengeStart({ year: 2027, today: '2026-12-04', from: 'this-week' })).toBe(mondayOfWeek(2027, 1));
    // 2025 has 52 ISO weeks (1 January 2025 is a Wednesday).
    expect(weeklyChallengeStart({ year: 2025, today: '2026-12-04', from: 'this-week' })).toBe(mondayOfWeek(2025, 52));
  });
});

describe('weeklyChallengeProgress from the day a challenge is made', () => {
  it('made today and starting this week, misses no week on day one', () => {
    const today = '2026-12-04';
    const countsFrom = weeklyChallengeStart({ year: 2026, today, from: 'this-week' });
    const progress = weeklyChallengeProgress({ year: 2026, books: [], today, countsFrom, createdOn: today });
    // Weeks 49 to 53 of 2026 (53 weeks: 1 January 2026 is a Thursday).
    expect(progress.weeks.map((week) => week.week)).toEqual([49, 50, 51, 52, 53]);
    expect(progress.weeks[0].monday).toBe(mondayOfWeek(2026, 49));
    expect(progress.target).toBe(5);
    expect(progress.weeks.every((week) => week.state === 'upcoming')).toBeTrue();
  });

  it('over the whole year, counts earlier books but calls no week before the challenge missed', () => {
    const today = '2026-12-04';
    const books = [{ id: 'w3', title: 'Saltmarsh Letters', authors: ['Ines Varga'], status: 'finished' as const, finishedOn: '2026-01-14' }];
    const countsFrom = weeklyChallengeStart({ year: 2026, today, from: 'whole-year' });
    const progress = weeklyChallengeProgress({ year: 2026, books, today, countsFrom, createdOn: today });
    expect(progress.target).toBe(53);
    expect(progress.done).toBe(1);
    const states = new Set(progress.weeks.map((week) => week.state));
    expect(states.has('missed')).toBeFalse();
    expect(progress.weeks[2].state).toBe('met');
    expect(progress.weeks[0].state).toBe('before');
    // A week over after the challenge was made and still unmet is missed.
    const later = weeklyChallengeProgress({ year: 2026, books, today: '2026-12-15', countsFrom, createdOn: today });
    expect(later.weeks.find((week) => week.week === 49)?.state).toBe('missed');
    expect(later.weeks.find((week) => week.week === 48)?.state).toBe('before');
  });

  it('takes a day of making after today for a clock out of step, and excuses no week for it', () => {
    const progress = weeklyChallengeProgress({ year: 2026, books: [], today: '2026-03-10', countsFrom: '2025-12-29', createdOn: '2026-12-04' });
    // ISO 8601: 10 March 2026 is in week 11, so weeks 1–10 are over and unmet.
    expect(progress.weeks.slice(0, 10).every((week) => week.state === 'missed')).toBeTrue();
    expect(progress.weeks[10].state).toBe('upcoming');
  });
});
