import { yearShelf } from './year-shelf';

const finished = (id: string, finishedOn: string) => ({ id, status: 'finished' as const, finishedOn, title: id, authors: [] });

describe('yearShelf', () => {
  const books = new Map([
    ['long', { id: 'long', title: 'The Long Valley Road', authors: ['Mara Oyelaran'], format: 'print', pageCount: 1200 }],
    ['short', { id: 'short', title: 'Small Hours', format: 'ebook', pageCount: 100 }],
    ['heard', { id: 'heard', title: 'River Voices', format: 'audiobook', audioMinutes: 600 }],
    ['unknown', { id: 'unknown', title: 'Untold', format: 'print' }],
  ]);

  it('stands the year’s finished books in the order they were finished, once each, at their latest finish', () => {
    const shelf = yearShelf(
      [
        finished('short', '2026-03-02'),
        finished('long', '2026-01-15'),
        finished('heard', '2025-12-30'),
        finished('heard', '2026-07-04'),
        finished('unknown', '2027-01-01'),
      ],
      books,
      2026,
    );
    expect(shelf.map((spine) => [spine.id, spine.finishedOn])).toEqual([
      ['long', '2026-01-15'],
      ['short', '2026-03-02'],
      ['heard', '2026-07-04'],
    ]);
  });

  it('makes a longer book a taller spine (worked by hand: 0.3 + 0.7 × pages / 1000, capped at 1000 pages)', () => {
    const byId = new Map(
      yearShelf(
        [finished('long', '2026-01-01'), finished('short', '2026-01-02'), finished('heard', '2026-01-03'), finished('unknown', '2026-01-04')],
        books,
        2026,
      ).map((s) => [s.id, s]),
    );

    expect(byId.get('long')!.height).toBe(1);
    expect(byId.get('short')!.height).toBeCloseTo(0.37, 10);
    // 600 minutes ÷ 2 minutes a page = 300 pages → 0.3 + 0.21.
    expect(byId.get('heard')!.pages).toBe(300);
    expect(byId.get('heard')!.height).toBeCloseTo(0.51, 10);
    expect(byId.get('unknown')!.height).toBe(0.6);
    expect(byId.get('short')!.format).toBe('ebook');
  });
});
