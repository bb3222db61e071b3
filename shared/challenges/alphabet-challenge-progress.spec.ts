import { alphabetChallengeProgress } from './alphabet-challenge-progress';
import { ChallengeBook } from './challenge-book';

// Invented books.
const book = (id: string, title: string, author: string, finishedOn?: string, status = 'finished'): ChallengeBook => ({
  id,
  title,
  authors: [author],
  status,
  finishedOn,
});
const year2026 = { start: '2026-01-01', end: '2026-12-31' };

describe('alphabetChallengeProgress', () => {
  const books = [
    book('q2', 'Quarry Songs', 'Lio Penhallow', '2026-05-02'),
    book('q1', 'The Quiet Orchard', 'Ada Okafor', '2026-02-11'),
    book('m1', 'A Marsh of Lanterns', 'Ruth Ellery', '2026-03-03'),
    book('e1', 'Émile and the Tidewater Clock', 'Marisol Ávila', '2026-04-20'),
    book('z0', 'Zephyr Hollow', 'Tamsin Greer', '2025-12-31'), // before the period
    book('b0', 'Brackwater', 'Noor Halvorsen', undefined, 'reading'), // not finished
  ];
  const tbr = [
    book('t1', 'Zephyr Hollow', 'Tamsin Greer', undefined, 'to-read'),
    book('t2', 'Brine and Bellflower', 'Ona Marsh', undefined, 'to-read'),
    book('t3', 'The Blue Ferry', 'Kit Ashdown', undefined, 'to-read'),
    book('t4', 'Quince Letters', 'Ivo Brand', undefined, 'to-read'),
  ];

  it('fills each letter with the earliest book finished in the period', () => {
    // Our rule; letters by alphabetKey (leading articles dropped, É folded to E).
    const progress = alphabetChallengeProgress({ by: 'title', period: year2026, books, tbr });
    const filled = progress.letters.filter((entry) => entry.bookId !== null);
    expect(filled).toEqual([
      { letter: 'E', bookId: 'e1' },
      { letter: 'M', bookId: 'm1' },
      { letter: 'Q', bookId: 'q1' },
    ]);
    expect(progress.counted).toEqual(['e1', 'm1', 'q1']);
    expect(progress.done).toBe(3);
    expect(progress.target).toBe(26);
    expect(progress.finished).toBeFalse();
  });

  it('lists A to Z, and the letters still open', () => {
    // ISO basic Latin alphabet: 26 letters A–Z (Unicode Basic Latin U+0041–U+005A).
    const progress = alphabetChallengeProgress({ by: 'title', period: year2026, books, tbr });
    expect(progress.letters.map((entry) => entry.letter).join('')).toBe('ABCDEFGHIJKLMNOPQRSTUVWXYZ');
    expect(progress.open.length).toBe(23);
    expect(progress.open).not.toContain('Q');
    expect(progress.open).toContain('Z');
  });

  it('suggests to-read books for open letters only', () => {
    // Our rule: "The Blue Ferry" files under B; Q is already filled, so "Quince Letters" is not offered.
    const progress = alphabetChallengeProgress({ by: 'title', period: year2026, books, tbr });
    expect(progress.suggestions['B']).toEqual(['t2', 't3']);
    expect(progress.suggestions['Z']).toEqual(['t1']);
    expect(progress.suggestions['Q']).toBeUndefined();
    expect(progress.suggestions['C']).toEqual([]);
  });

  it('can go by the first author’s surname', () => {
    // Surnames: Okafor → O, Ellery → E, Ávila → A (É/Á folded, UnicodeData.txt), Penhallow → P.
    const progress = alphabetChallengeProgress({ by: 'author-surname', period: year2026, books, tbr });
    expect(progress.letters.filter((entry) => entry.bookId !== null)).toEqual([
      { letter: 'A', bookId: 'e1' },
      { letter: 'E', bookId: 'm1' },
      { letter: 'O', bookId: 'q1' },
      { letter: 'P', bookId: 'q2' },
    ]);
    expect(progress.suggestions['G']).toEqual(['t1']);
  });

  it('is finished when all 26 letters are filled', () => {
    const all = Array.from({ length: 26 }, (_, index) => {
      const letter = String.fromCharCode(65 + index);
      return book(`x${letter}`, `${letter}rdley Notes`, 'Pim Sallow', '2026-06-01');
    });
    const progress = alphabetChallengeProgress({ by: 'title', period: year2026, books: all, tbr: [] });
    expect(progress.done).toBe(26);
    expect(progress.open).toEqual([]);
    expect(progress.finished).toBeTrue();
  });
});
