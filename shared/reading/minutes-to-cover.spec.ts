import { minutesToCover } from './minutes-to-cover';

describe('minutesToCover', () => {
  it('turns pages or percent per hour into minutes (hand-worked)', () => {
    // 300 pages at 30 pages/hour = 10 hours = 600 minutes.
    expect(minutesToCover(300, { format: 'print', rate: 30 })).toBe(600);
    // 40 % at 10 %/hour = 4 hours = 240 minutes.
    expect(minutesToCover(40, { format: 'ebook', rate: 10 })).toBe(240);
  });

  it('divides listened minutes by the listening rate', () => {
    // A 10-hour audiobook at 1.5× takes 600 / 1.5 = 400 real minutes.
    expect(minutesToCover(600, { format: 'audiobook', rate: 1.5 })).toBe(400);
  });

  it('needs nothing for nothing left, and refuses a pace that never finishes', () => {
    expect(minutesToCover(0, { format: 'print', rate: 30 })).toBe(0);
    expect(minutesToCover(-3, { format: 'print', rate: 30 })).toBe(0);
    expect(() => minutesToCover(10, { format: 'print', rate: 0 })).toThrowError(RangeError);
  });
});
