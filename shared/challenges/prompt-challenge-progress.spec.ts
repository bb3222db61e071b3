import { ChallengeBook } from './challenge-book';
import { promptChallengeProgress } from './prompt-challenge-progress';

// Invented books and prompts; the rules are ours.
const books: ChallengeBook[] = [
  { id: 'orchard', title: 'The Quiet Orchard', authors: ['Ada Okafor'], status: 'finished', finishedOn: '2026-03-03' },
  { id: 'owl', title: 'An Owl at Dusk', authors: ['Noor Halvorsen'], status: 'reading' },
  { id: 'old', title: 'Brackwater', authors: ['Tamsin Greer'], status: 'finished', finishedOn: '2025-11-30' },
];
const period = { start: '2026-01-01', end: '2026-12-31' };

describe('promptChallengeProgress', () => {
  it('marks prompts open, planned or done', () => {
    const progress = promptChallengeProgress({
      period,
      books,
      prompts: [
        { id: 'p1', text: 'A book set in an orchard', bookId: 'orchard' },
        { id: 'p2', text: 'A bird in the title', bookId: 'owl' },
        { id: 'p3', text: 'A book from a small press' },
        { id: 'p4', text: 'Finished last year', bookId: 'old' },
        { id: 'p5', text: 'A book since removed', bookId: 'gone' },
      ],
    });
    expect(progress.prompts.map((prompt) => [prompt.id, prompt.state, prompt.bookId])).toEqual([
      ['p1', 'done', 'orchard'],
      ['p2', 'planned', 'owl'],
      ['p3', 'open', null],
      ['p4', 'planned', 'old'], // finished, but before the period
      ['p5', 'open', null], // no such book in the library
    ]);
    expect(progress.done).toBe(1);
    expect(progress.target).toBe(5);
    expect(progress.counted).toEqual(['orchard']);
    expect(progress.finished).toBeFalse();
  });

  it('lets one book answer two prompts, counting the book once', () => {
    const progress = promptChallengeProgress({
      period,
      books,
      prompts: [
        { id: 'p1', text: 'A book set in an orchard', bookId: 'orchard' },
        { id: 'p2', text: 'A quiet book', bookId: 'orchard' },
      ],
    });
    expect(progress.done).toBe(2);
    expect(progress.counted).toEqual(['orchard']);
    expect(progress.finished).toBeTrue();
  });

  it('is not finished with no prompts at all', () => {
    expect(promptChallengeProgress({ period, books, prompts: [] }).finished).toBeFalse();
  });
});
