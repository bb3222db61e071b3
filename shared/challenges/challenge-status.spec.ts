import { alphabetChallengeProgress } from './alphabet-challenge-progress';
import { ChallengeBook } from './challenge-book';
import { challengeStatus } from './challenge-status';
import { countChallengeProgress } from './count-challenge-progress';
import { promptChallengeProgress } from './prompt-challenge-progress';
import { weeklyChallengeProgress } from './weekly-challenge-progress';

const year2026 = { start: '2026-01-01', end: '2026-12-31' };

describe('challengeStatus', () => {
  it('is finished when done reaches a target above 0', () => {
    // Our rule.
    expect(challengeStatus({ period: year2026, done: 24, target: 25, counted: [] }).finished).toBeFalse();
    expect(challengeStatus({ period: year2026, done: 25, target: 25, counted: [] }).finished).toBeTrue();
    expect(challengeStatus({ period: year2026, done: 0, target: 0, counted: [] }).finished).toBeFalse();
  });

  it('refuses a period that is backwards or not made of dates', () => {
    // RFC 3339 §5.1: same-shaped dates compare as text in time order.
    expect(() => challengeStatus({ period: { start: '2026-02-01', end: '2026-01-31' }, done: 0, target: 1, counted: [] })).toThrowError(RangeError);
    expect(() => challengeStatus({ period: { start: '2026-01-01', end: '2026-13-01' }, done: 0, target: 1, counted: [] })).toThrowError(RangeError);
    expect(() => challengeStatus({ period: year2026, done: -1, target: 1, counted: [] })).toThrowError(RangeError);
  });

  it('lets one book count toward several challenges at once', () => {
    // Invented book. "The Quiet Orchard" files under Q (leading article dropped, ALA filing
    // practice); 2026-03-03 is in 2026-W10 (Python date.isocalendar() → (2026, 10, 2)).
    const orchard: ChallengeBook = { id: 'orchard', title: 'The Quiet Orchard', authors: ['Ada Okafor'], status: 'finished', finishedOn: '2026-03-03' };
    const books = [orchard];

    const count = countChallengeProgress({ target: 25, period: year2026, books });
    const alphabet = alphabetChallengeProgress({ by: 'title', period: year2026, books, tbr: [] });
    const weekly = weeklyChallengeProgress({ year: 2026, books, today: '2026-03-04' });
    const prompts = promptChallengeProgress({ period: year2026, books, prompts: [{ id: 'p1', text: 'A book set in an orchard', bookId: 'orchard' }] });

    for (const status of [count, alphabet, weekly, prompts]) {
      expect(status.counted).toEqual(['orchard']);
      expect(status.done).toBe(1);
    }
    expect(alphabet.letters.find((entry) => entry.letter === 'Q')?.bookId).toBe('orchard');
    expect(weekly.weeks[9]).toEqual(jasmine.objectContaining({ week: 10, state: 'met' }));
    expect(prompts.finished).toBeTrue();
  });
});
