import { monthlyPace } from './monthly-pace';

// Offsets from the IANA tz database: Asia/Tokyo is UTC+9 all year (no daylight saving time).
const TOKYO = 'Asia/Tokyo';

describe('monthlyPace', () => {
  const sessions = [
    // March, print, 40 pages in 60 active minutes → 40 pages per hour.
    { format: 'print', startedAt: '2026-03-02T10:00:00Z', endedAt: '2026-03-02T11:10:00Z', activeMinutes: 60, fromPosition: 10, toPosition: 50 },
    // March, print, 20 pages in 40 minutes. With the first: 60 pages in 100 minutes = 36 pages per hour.
    { format: 'print', startedAt: '2026-03-09T10:00:00Z', endedAt: '2026-03-09T10:40:00Z', activeMinutes: 40, fromPosition: 50, toPosition: 70 },
    // An ebook session and a print session without pages: left out, they must not dilute the pace.
    { format: 'ebook', startedAt: '2026-03-10T10:00:00Z', endedAt: '2026-03-10T11:00:00Z', activeMinutes: 60, fromPosition: 10, toPosition: 40 },
    { format: 'print', startedAt: '2026-03-11T10:00:00Z', endedAt: '2026-03-11T11:00:00Z', activeMinutes: 60 },
    // 31 July 14:30–15:30 UTC is Tokyo 23:30 on 31 July to 00:30 on 1 August: half in each month.
    { format: 'print', startedAt: '2026-07-31T14:30:00Z', endedAt: '2026-07-31T15:30:00Z', activeMinutes: 60, fromPosition: 0, toPosition: 30 },
    { format: 'print', startedAt: '2026-05-01T10:00:00Z', endedAt: '2026-05-01T11:00:00Z', activeMinutes: 30, fromPosition: 0, toPosition: 30, deleted: true },
  ];

  it('gives pages per hour of timed print reading, month by month (worked by hand)', () => {
    const months = monthlyPace(sessions, 2026, TOKYO);
    expect(months.length).toBe(12);
    expect(months[2]).toEqual({ month: '2026-03', pages: 60, minutes: 100, pagesPerHour: 36 });
    expect(months[4].pagesPerHour).withContext('a deleted session counts nothing').toBeNull();
    expect(months[6].pages).toBeCloseTo(15, 9);
    expect(months[6].minutes).toBeCloseTo(30, 9);
    expect(months[7].pagesPerHour).toBeCloseTo(30, 9);
    expect(months[0]).toEqual({ month: '2026-01', pages: 0, minutes: 0, pagesPerHour: null });
  });

  it('keeps the midnight session in July alone in UTC', () => {
    const months = monthlyPace(sessions, 2026, 'UTC');
    expect(months[6]).toEqual({ month: '2026-07', pages: 30, minutes: 60, pagesPerHour: 30 });
    expect(months[7].pagesPerHour).toBeNull();
  });
});
