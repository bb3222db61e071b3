import type { DailyLogEntry } from '../reading-log/log-session';
import { ReviewBookRow, yearReview } from './year-review';
import { inventedFinish as finished } from '../challenges/testing/invented-book';

// An invented reader's 2028. 2028 is a leap year (Gregorian rule: divisible by 4, not a century),
// so 28 February, 29 February and 1 March are three consecutive days.
const rows: ReviewBookRow[] = [
  { id: 'b1', title: 'Salt Orchard', authors: ['Mirela Quist'], format: 'print', pageCount: 412, genres: ['Fantasy'], rating: 4.5 },
  { id: 'b2', title: 'The Long Ferry', authors: ['Tobin Asare'], format: 'audiobook', genres: ['fantasy', 'Sea stories'], rating: 5 },
  { id: 'b3', title: 'Nine Lanterns', authors: ['Ines Halloran'], format: 'print', pageCount: 188, genres: ['Poetry'], rating: 5 },
  { id: 'b4', title: 'Glass Weather', authors: ['Oskar Lind'], format: 'ebook', pageCount: 260, rating: 3 },
  { id: 'b5', title: 'Last Year’s Book', authors: ['Oskar Lind'], format: 'print', pageCount: 900, rating: 5 },
];
const books = new Map(rows.map((row) => [row.id, row]));
const finishedList = [
  finished('b5', '2027-12-30'),
  finished('b1', '2028-01-20'),
  finished('b2', '2028-02-29'),
  finished('b3', '2028-03-01'),
  finished('b4', '2028-06-11'),
];
const log: DailyLogEntry[] = [
  { day: '2027-12-31', minutes: 50, pages: 30 },
  { day: '2028-01-01', minutes: 20, pages: 10 },
  { day: '2028-02-28', minutes: 30, pages: 20 },
  { day: '2028-02-29', minutes: 45, pages: 25 },
  { day: '2028-03-01', minutes: 60, pages: 40 },
  { day: '2028-06-11', minutes: 15, pages: 12 },
  { day: '2028-06-12', minutes: 0, pages: 0 },
];

describe('yearReview', () => {
  const review = yearReview({ year: 2028, today: '2028-12-02', finished: finishedList, books, log, bestBookId: 'b3' });

  it('counts the books, pages, minutes and reading days of the year only (worked by hand)', () => {
    expect(review.books).toBe(4);
    expect(review.pages).toBe(10 + 20 + 25 + 40 + 12);
    expect(review.minutes).toBe(20 + 30 + 45 + 60 + 15);
    // 1 Jan, 28 Feb, 29 Feb, 1 Mar, 11 Jun; 12 Jun logged nothing.
    expect(review.readingDays).toBe(5);
  });

  it('finds the longest streak across the leap day, not across the new year', () => {
    // 31 Dec 2027 + 1 Jan 2028 would be 2; inside 2028 the run 28 Feb–1 Mar is 3.
    expect(review.longestStreak).toBe(3);
  });

  it('names the busiest month, the longest and highest rated books, formats and the top genre', () => {
    // February: 75 minutes, March: 60; a tie would go to the month with more books.
    expect(review.busiestMonth).toEqual({ month: '2028-02', books: 1, minutes: 75 });
    expect(review.longestBook?.title).toBe('Salt Orchard');
    // Two 5-star books: the later finish (1 March) first.
    expect(review.highestRated.map((book) => book.id)).toEqual(['b3', 'b2', 'b1']);
    expect(review.formats).toEqual({ print: 2, ebook: 1, audiobook: 1 });
    expect(review.topGenre).toBe('Fantasy');
    // (4.5 + 5 + 5 + 3) / 4 = 4.375
    expect(review.averageRating).toBe(4.375);
    expect(review.bestBook?.title).toBe('Nine Lanterns');
  });

  it('is empty, not broken, for a year without reading', () => {
    const empty = yearReview({ year: 2030, today: '2028-12-02', finished: finishedList, books, log });
    expect(empty.books).toBe(0);
    expect(empty.busiestMonth).toBeNull();
    expect(empty.longestBook).toBeNull();
    expect(empty.averageRating).toBeNull();
    expect(empty.longestStreak).toBe(0);
    expect(empty.bestBook).toBeNull();
  });
});
