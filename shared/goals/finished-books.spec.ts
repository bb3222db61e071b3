import { challengeBooks, finishedBooks, GoalBookRow, GoalReadingRow } from './finished-books';

// Invented books. Offsets from the IANA tz database: Asia/Tokyo is UTC+9 all year (no DST);
// America/Los_Angeles is UTC−8 (PST), and UTC−7 (PDT) from 02:00 on the second Sunday of March
// to 02:00 on the first Sunday of November (Energy Policy Act of 2005 §110, 15 U.S.C. 260a):
// 8 March and 1 November in 2026.
const LA = 'America/Los_Angeles';
const TOKYO = 'Asia/Tokyo';

const book = (id: string, fields: Partial<GoalBookRow> = {}): GoalBookRow => ({
  id,
  title: `Tidewater ${id}`,
  authors: ['Ada Okafor'],
  status: 'finished',
  ...fields,
});
const days = (list: { id: string; finishedOn: string }[]) => list.map((entry) => [entry.id, entry.finishedOn]);

describe('finishedBooks', () => {
  it('dates a book by each of its readings, whatever order the readings come in', () => {
    const readings: GoalReadingRow[] = [
      { bookId: 'a', finishedOn: '2025-04-02' },
      { bookId: 'a', finishedOn: '2026-03-15' }, // the re-read: latest
      { bookId: 'a', finishedOn: '2024-11-30' },
      { bookId: 'a', finishedOn: null }, // a reading under way
    ];
    // The status change (a later day) is only a fallback: the readings' own dates win. One entry
    // per finish, so the 2026 re-read counts in 2026 and the first reading in its own year.
    const finished = finishedBooks([book('a', { statusChangedAt: '2026-05-01T10:00:00Z' })], readings, 'UTC');
    expect(days(finished)).toEqual([
      ['a', '2024-11-30'],
      ['a', '2025-04-02'],
      ['a', '2026-03-15'],
    ]);
    expect(finished[2]).toEqual({ id: 'a', title: 'Tidewater a', authors: ['Ada Okafor'], status: 'finished', finishedOn: '2026-03-15' });
  });

  it('falls back on the local day of the status change, in the reader’s zone', () => {
    // 2026-03-01T06:30Z: 22:30 PST on 28 February in Los Angeles (UTC−8), 15:30 JST on 1 March in Tokyo (UTC+9).
    const books = [book('b', { statusChangedAt: '2026-03-01T06:30:00Z' })];
    expect(days(finishedBooks(books, [], LA))).toEqual([['b', '2026-02-28']]);
    expect(days(finishedBooks(books, [], TOKYO))).toEqual([['b', '2026-03-01']]);
  });

  it('uses the offset in force on the day (US daylight saving time starts and ends)', () => {
    // 2026-03-09T07:30Z is 00:30 PDT on 9 March (UTC−7 since 8 March); by winter time it would still be 8 March.
    // 2026-11-02T07:30Z is 23:30 PST on 1 November (UTC−8 again since that morning); by summer time it would be 2 November.
    // Tokyo (UTC+9): 16:30 on 9 March and 16:30 on 2 November.
    const books = [book('spring', { statusChangedAt: '2026-03-09T07:30:00Z' }), book('autumn', { statusChangedAt: '2026-11-02T07:30:00Z' })];
    expect(days(finishedBooks(books, [], LA))).toEqual([
      ['spring', '2026-03-09'],
      ['autumn', '2026-11-01'],
    ]);
    expect(days(finishedBooks(books, [], TOKYO))).toEqual([
      ['spring', '2026-03-09'],
      ['autumn', '2026-11-02'],
    ]);
  });

  it('puts a New Year’s Eve finish in the year the reader was in', () => {
    // 2026-12-31T15:30Z is 00:30 JST on 1 January 2027 in Tokyo, and 07:30 PST on 31 December 2026 in Los Angeles.
    const books = [book('eve', { statusChangedAt: '2026-12-31T15:30:00Z' })];
    expect(days(finishedBooks(books, [], TOKYO))).toEqual([['eve', '2027-01-01']]);
    expect(days(finishedBooks(books, [], LA))).toEqual([['eve', '2026-12-31']]);
  });

  it('leaves out books not finished, deleted ones, deleted readings and finishes with no date', () => {
    const books = [
      book('tbr', { status: 'tbr', statusChangedAt: '2026-01-05T10:00:00Z' }),
      book('gone', { deleted: true, statusChangedAt: '2026-01-05T10:00:00Z' }),
      book('undated'), // finished, but neither a reading nor a status change says when
      book('erased', { status: 'reading' }),
    ];
    const readings: GoalReadingRow[] = [
      { bookId: 'erased', finishedOn: '2026-02-02', deleted: true },
      { bookId: 'gone', finishedOn: '2026-02-02' },
      { bookId: 'nowhere', finishedOn: '2026-02-02' },
    ];
    expect(finishedBooks(books, readings, 'UTC')).toEqual([]);
  });

  it('keeps a finished reading while the book is read again or set aside', () => {
    // Our rule: starting a re-read must not take a finished book off the reader's year.
    const books = [book('again', { status: 'reading' }), book('set-aside', { status: 'dnf' })];
    const readings = [
      { bookId: 'again', finishedOn: '2026-02-02' },
      { bookId: 'set-aside', finishedOn: '2026-01-20' },
    ];
    expect(days(finishedBooks(books, readings, 'UTC'))).toEqual([
      ['set-aside', '2026-01-20'],
      ['again', '2026-02-02'],
    ]);
  });

  it('sorts by day, then by id', () => {
    const readings = [
      { bookId: 'z', finishedOn: '2026-02-02' },
      { bookId: 'm', finishedOn: '2026-02-01' },
      { bookId: 'a', finishedOn: '2026-02-02' },
    ];
    expect(finishedBooks([book('z'), book('m'), book('a')], readings, 'UTC').map((entry) => entry.id)).toEqual(['m', 'a', 'z']);
  });

  it('refuses an unknown time zone', () => {
    expect(() => finishedBooks([book('b', { statusChangedAt: '2026-03-01T06:30:00Z' })], [], 'Mars/Olympus_Mons')).toThrowError(RangeError);
  });
});

describe('challengeBooks', () => {
  it('keeps every book, the finished ones with their day and the rest with their own status', () => {
    const books = [
      book('done', { statusChangedAt: '2026-03-01T06:30:00Z' }),
      book('next', { status: 'tbr', title: 'The Blue Ferry' }),
      book('gone', { deleted: true }),
      { id: 'bare' },
    ];
    expect(challengeBooks(books, [], LA)).toEqual([
      { id: 'done', title: 'Tidewater done', authors: ['Ada Okafor'], status: 'finished', finishedOn: '2026-02-28' },
      { id: 'next', title: 'The Blue Ferry', authors: ['Ada Okafor'], status: 'tbr' },
      { id: 'bare', title: '', authors: [], status: '' },
    ]);
  });
});
