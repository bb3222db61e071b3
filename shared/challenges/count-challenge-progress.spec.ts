import { COUNT_CHALLENGE_TARGETS, countChallengeProgress } from './count-challenge-progress';
import { inventedBook as book } from './testing/invented-book';

describe('countChallengeProgress', () => {
  it('offers 25, 50 and 100 as ready-made targets', () => {
    // Product decision (ours), as set out in the brief for this feature.
    expect([...COUNT_CHALLENGE_TARGETS]).toEqual([25, 50, 100]);
  });

  it('counts books finished in the period, both ends included, earliest first', () => {
    // A summer challenge 2026-06-01..2026-08-31; ISO 8601 dates compare as text in time
    // order (RFC 3339 §5.1), so 05-31 and 09-01 fall outside it.
    const books = [
      book('aug31', '2026-08-31'),
      book('may31', '2026-05-31'),
      book('jun01', '2026-06-01'),
      book('sep01', '2026-09-01'),
      book('reading', '2026-07-10', 'reading'),
      book('no-date', undefined),
      book('jul10', '2026-07-10'),
    ];
    const progress = countChallengeProgress({ target: 25, period: { start: '2026-06-01', end: '2026-08-31' }, books });
    expect(progress.counted).toEqual(['jun01', 'jul10', 'aug31']);
    expect(progress.done).toBe(3);
    expect(progress.target).toBe(25);
    expect(progress.finished).toBeFalse();
  });

  it('is finished once the target is reached, and keeps counting after', () => {
    const books = [book('a', '2026-01-02'), book('b', '2026-01-03'), book('c', '2026-01-04')];
    const progress = countChallengeProgress({ target: 2, period: { start: '2026-01-01', end: '2026-12-31' }, books });
    expect(progress.finished).toBeTrue();
    expect(progress.done).toBe(3);
  });

  it('refuses a target below 1 and a period that ends before it starts', () => {
    const period = { start: '2026-01-01', end: '2026-12-31' };
    expect(() => countChallengeProgress({ target: 0, period, books: [] })).toThrowError(RangeError);
    expect(() => countChallengeProgress({ target: 2.5, period, books: [] })).toThrowError(RangeError);
    expect(() => countChallengeProgress({ target: 25, period: { start: '2026-12-31', end: '2026-01-01' }, books: [] })).toThrowError(RangeError);
  });
});
