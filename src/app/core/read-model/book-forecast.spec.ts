import type { Book, Session } from '@shared/sync/schema/collections';

import { bookForecast, bookProgress } from './book-forecast';

describe('bookForecast', () => {
  const book: Book = { id: 'b1', title: 'The Salt Road', format: 'print', pageCount: 300, status: 'reading' };
  const other: Book = { id: 'b2', title: 'Lantern Weather', format: 'print', pageCount: 200, status: 'finished' };
  const session = (id: string, bookId: string, start: string, minutes: number, from: number, to: number, extra: Partial<Session> = {}): Session => ({
    id,
    bookId,
    format: 'print',
    startedAt: start,
    endedAt: new Date(Date.parse(start) + minutes * 60_000).toISOString(),
    activeMinutes: minutes,
    fromPosition: from,
    toPosition: to,
    ...extra,
  });
  const two = [session('s1', 'b1', '2026-11-30T19:00:00Z', 40, 0, 30), session('s2', 'b1', '2026-12-01T19:00:00Z', 30, 30, 60)];

  it('shows progress from the latest session, in the book’s unit', () => {
    expect(bookProgress(book, two)).toEqual({ position: 60, end: 300, fraction: 0.2 });
    expect(bookProgress({ ...book, pageCount: null }, two)).toEqual({ position: 60, end: null, fraction: null });
    expect(bookProgress({ id: 'e', format: 'ebook' }, [])).toEqual({ position: 0, end: 100, fraction: 0 });
  });

  it('falls back to typical reading speeds with fewer than three sessions', () => {
    // Brysbaert (2019): 238 words a minute (non-fiction, the figure for an unknown genre); 275
    // words a page: 240 pages left take 240 × 275 / 238 = 277.3 minutes. 70 minutes over the 2
    // days since the first session is 35 a day: 277.3 / 35 = 7.9, so 8 days, today included.
    const forecast = bookForecast(book, two, [book], '2026-12-01', 'UTC')!;
    expect(forecast.paceFrom).toBe('typical');
    expect(forecast.minutesLeft).toBeCloseTo((240 * 275) / 238, 6);
    expect(forecast.minutesPerDay).toBe(35);
    expect(forecast.finishDate).toBe('2026-12-08');
  });

  it('uses the fiction rate for a novel', () => {
    // Brysbaert (2019): 260 words a minute for fiction. 240 pages × 275 words / 260 = 253.8 minutes.
    const novel = { ...book, genres: ['Fantasy'] };
    const forecast = bookForecast(novel, two, [novel], '2026-12-01', 'UTC')!;
    expect(forecast.minutesLeft).toBeCloseTo((240 * 275) / 260, 6);
  });

  it('uses the reader’s own pace in the format, across their books, from the third session', () => {
    // Rates 45, 60 and 20 pages an hour; median 45. 240 pages at 45 an hour are 320 minutes;
    // 130 minutes over 3 days is 43.3 a day: 320 / 43.3 = 7.4, so 8 days from 1 December.
    const sessions = [...two, session('s0', 'b2', '2026-11-29T19:00:00Z', 60, 0, 20)];
    const forecast = bookForecast(book, sessions, [book, other], '2026-12-01', 'UTC')!;
    expect(forecast.paceFrom).toBe('personal');
    expect(forecast.pace).toEqual({ format: 'print', rate: 45 });
    expect(forecast.minutesLeft).toBeCloseTo(320, 9);
    expect(forecast.finishDate).toBe('2026-12-08');
  });

  it('counts an ebook’s pace from that book only, since percent depends on its length', () => {
    const ebook: Book = { id: 'e1', format: 'ebook', pageCount: 300 };
    const elsewhere = [1, 2, 3].map((d) => session(`x${d}`, 'b2', `2026-11-2${d}T19:00:00Z`, 60, 0, 50, { format: 'ebook' }));
    const forecast = bookForecast(ebook, elsewhere, [ebook, other], '2026-12-01', 'UTC')!;
    // Brysbaert (2019) 238 wpm over 300 × 275 words: 17.3 percent an hour, 100 % in 346.6 min.
    expect(forecast.paceFrom).toBe('typical');
    expect(forecast.minutesLeft).toBeCloseTo((300 * 275) / 238, 6);
  });

  it('takes an audiobook’s playback speed from its latest session until it has its own pace', () => {
    const audio: Book = { id: 'a1', format: 'audiobook', audioMinutes: 600 };
    const listened = session('l1', 'a1', '2026-12-01T19:00:00Z', 60, 0, 90, { format: 'audiobook', playbackSpeed: 1.5 });
    // At 1.5× one real minute covers 1.5 listened minutes: 510 left take 340 minutes.
    expect(bookForecast(audio, [listened], [audio], '2026-12-01', 'UTC')!.minutesLeft).toBeCloseTo(340, 9);
  });

  it('has no forecast without a length, and no finish date without reading days', () => {
    expect(bookForecast({ ...book, pageCount: null }, two, [book], '2026-12-01', 'UTC')).toBeNull();
    const untouched = bookForecast(book, [], [book], '2026-12-01', 'UTC')!;
    expect(untouched.finishDate).toBeNull();
    expect(untouched.minutesLeft).toBeCloseTo((300 * 275) / 238, 6);
  });
});
