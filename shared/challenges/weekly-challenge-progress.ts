import { isoWeekOf } from '../calendar/iso-week-of';
import { IsoWeekSpan } from '../calendar/iso-week';
import { isoWeeksOfYear } from '../calendar/iso-weeks-of-year';
import { parseCalendarDay } from '../calendar/parse-calendar-day';
import { booksFinishedIn } from './books-finished-in';
import { ChallengeBook, ChallengeStatus } from './challenge-book';
import { challengeStatus } from './challenge-status';

/**
 * 'before' is a week the challenge does not hold against the reader: one before its first week,
 * or one that was over before the challenge was made.
 */
export type WeekState = 'met' | 'missed' | 'upcoming' | 'before';

export interface ChallengeWeek extends IsoWeekSpan {
  /** Books finished in this ISO week, earliest first. */
  readonly bookIds: readonly string[];
  /** 'upcoming' covers the week in progress until a book is finished or the week ends. */
  readonly state: WeekState;
}

export interface WeeklyChallengeProgress extends ChallengeStatus {
  readonly weeks: readonly ChallengeWeek[];
}

/**
 * A "book a week" challenge over the ISO 8601 week-numbering year `year` (52 or 53 weeks,
 * Monday to Sunday; week 1 can start in December and the last week end in January). A week is
 * met by any book finished in it.
 *
 * @param today the reader's local date, 'YYYY-MM-DD': weeks ended before it are missed if unmet.
 * @param countsFrom the challenge's first day: weeks ending before it are neither counted nor missed.
 * @param createdOn the day the challenge was made: a week over before it is never called missed.
 * @example
 * const progress = weeklyChallengeProgress({ year: 2026, books, today: '2026-03-04' });
 * progress.weeks.length // 53
 * progress.weeks[52].sunday // '2027-01-03'
 */
export function weeklyChallengeProgress(input: {
  readonly year: number;
  readonly books: readonly ChallengeBook[];
  readonly today: string;
  readonly countsFrom?: string;
  readonly createdOn?: string;
}): WeeklyChallengeProgress {
  const { year, today } = input;
  parseCalendarDay(today);
  const countsFrom = input.countsFrom ?? '';
  // A day of making after today is a clock out of step, not a fact: then no week is excused.
  const createdOn = input.createdOn && input.createdOn <= today ? input.createdOn : '';
  const allWeeks = isoWeeksOfYear(year);
  const counted = allWeeks.filter((span) => span.sunday >= countsFrom);
  // A start past the year's last week still leaves that week to count.
  const spans = counted.length > 0 ? counted : allWeeks.slice(-1);
  const period = { start: spans[0].monday, end: spans[spans.length - 1].sunday };

  const byWeek = new Map<number, string[]>();
  for (const book of booksFinishedIn(input.books, period)) {
    const { week } = isoWeekOf(book.finishedOn);
    byWeek.set(week, [...(byWeek.get(week) ?? []), book.id]);
  }

  const weeks = spans.map((span): ChallengeWeek => {
    const bookIds = byWeek.get(span.week) ?? [];
    // Same-shaped ISO 8601 dates sort as text in time order (RFC 3339 §5.1).
    const state: WeekState = bookIds.length > 0 ? 'met' : span.sunday >= today ? 'upcoming' : span.sunday < createdOn ? 'before' : 'missed';
    return { ...span, bookIds, state };
  });
  const done = weeks.filter((week) => week.state === 'met').length;
  const bookIds = weeks.flatMap((week) => week.bookIds);
  return { ...challengeStatus({ period, done, target: weeks.length, counted: bookIds }), weeks };
}
