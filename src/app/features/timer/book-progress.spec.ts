import type { Session } from '@shared/sync/schema/collections';

import { elapsedText, latestSession, minutesWords, positionEnd, positionUnit, progressFraction, progressLine, reachedEnd } from './book-progress';

describe('book progress in the book’s own unit', () => {
  const print = { format: 'print' as const, pageCount: 320, audioMinutes: null };
  const ebook = { format: 'ebook' as const, pageCount: 410, audioMinutes: null };
  const audio = { format: 'audiobook' as const, pageCount: null, audioMinutes: 665 };

  it('counts pages for print, percent for ebooks and listened minutes for audiobooks (as sessions store them)', () => {
    expect([print, ebook, audio].map(positionUnit)).toEqual(['page', 'percent', 'minute']);
    expect([print, ebook, audio].map(positionEnd)).toEqual([320, 100, 665]);
    expect(positionEnd({ format: 'print', pageCount: null, audioMinutes: null })).toBeNull();
  });

  it('says where the reader is in words', () => {
    expect(progressLine(print, 120)).toBe('Page 120 of 320');
    expect(progressLine(ebook, 42)).toBe('42 % read');
    // 200 min = 3 h 20 min; 665 min = 11 h 5 min.
    expect(progressLine(audio, 200)).toBe('3 h 20 min of 11 h 5 min');
    expect(progressLine(print, null)).toBe('320 pages');
    expect(progressLine(ebook, null)).toBe('Not started yet');
    expect(progressLine({ format: 'print', pageCount: null, audioMinutes: null }, 7)).toBe('Page 7');
  });

  it('gives the fraction read, kept between 0 and 1, and knows the end', () => {
    expect(progressFraction(print, 80)).toBe(0.25);
    expect(progressFraction(print, 400)).toBe(1);
    expect(progressFraction({ format: 'print', pageCount: null, audioMinutes: null }, 80)).toBeNull();
    expect(reachedEnd(print, 320)).toBeTrue();
    expect(reachedEnd(ebook, 99.5)).toBeFalse();
    expect(reachedEnd(audio, 665)).toBeTrue();
    expect(reachedEnd(audio, null)).toBeFalse();
  });

  it('shows elapsed time as a clock does, and minutes in words', () => {
    expect(elapsedText(0)).toBe('00:00');
    expect(elapsedText(25 * 60_000 + 3_999)).toBe('25:03');
    expect(elapsedText(3_909_000)).toBe('1:05:09'); // 1 h 5 min 9 s
    expect(minutesWords(25.4)).toBe('25 minutes');
    expect(minutesWords(1)).toBe('1 minute');
    expect(minutesWords(0.3)).toBe('less than a minute');
  });

  it('finds the latest session of a book, leaving out deleted ones, one id, and those without the field asked for', () => {
    const session = (id: string, startedAt: string, fields: Partial<Session> = {}) => ({ id, bookId: 'b', startedAt, deleted: false, ...fields }) as Session;
    const sessions = [
      session('1', '2026-03-01T08:00:00Z', { toPosition: 40 }),
      session('2', '2026-03-03T08:00:00Z', { toPosition: 90, deleted: true }),
      session('3', '2026-03-02T08:00:00Z', { toPosition: 70 }),
      session('4', '2026-03-04T08:00:00Z'),
      { ...session('5', '2026-03-05T08:00:00Z', { toPosition: 99 }), bookId: 'other' },
    ];
    expect(latestSession(sessions, 'b')?.id).toBe('4');
    expect(latestSession(sessions, 'b', { having: 'toPosition' })?.id).toBe('3');
    expect(latestSession(sessions, 'b', { having: 'toPosition', exceptId: '3' })?.id).toBe('1');
    expect(latestSession(sessions, 'none')).toBeUndefined();
  });
});
