import { computed, inject, type Signal } from '@angular/core';

import { challengeBooks, finishedBooks, type FinishedBook } from '@shared/goals/finished-books';
import { sessionLog } from '@shared/goals/amounts-in';
import type { ChallengeBook } from '@shared/challenges/challenge-book';
import type { DailyLogEntry } from '@shared/reading-log/log-session';
import type { Book, Challenge, MonthPlan, Reading, Session, YearPlan } from '@shared/sync/schema/collections';

import { liveQuerySignal } from '../data/live-query';
import { TIME_ZONE } from '../time/time-zone';
import { readerToday } from '../time/reader-today';

/** The rows goals and challenges read, not deleted. */
export interface GoalRowSet {
  readonly books: readonly Book[];
  readonly readings: readonly Reading[];
  readonly sessions: readonly Session[];
  readonly yearPlans: readonly YearPlan[];
  readonly monthPlans: readonly MonthPlan[];
  readonly challenges: readonly Challenge[];
}

/** What goals and challenges are computed from, kept live. */
export interface GoalRecord {
  /** Null until the first read of this device's journal has come back. */
  readonly rows: Signal<GoalRowSet | null>;
  /** Every book, the finished ones with their local day (see `challengeBooks`). */
  readonly library: Signal<readonly ChallengeBook[]>;
  /** The finished books, earliest first. */
  readonly finished: Signal<readonly FinishedBook[]>;
  /** Minutes and pages per local day, from the sessions. */
  readonly log: Signal<readonly DailyLogEntry[]>;
  readonly bookById: Signal<ReadonlyMap<string, Book>>;
  /** The reader's local date when the page opened. */
  readonly today: string;
}

/**
 * The reader's books, readings, sessions, plans and challenges from this device, as live signals,
 * with the finished books and the daily log worked out in their time zone. Call in an injection
 * context (a component's fields): the live query ends with the component.
 */
export function goalRecord(): GoalRecord {
  const timeZone = inject(TIME_ZONE);
  const rows = liveQuerySignal<GoalRowSet | null>((db) => db.currentOf('books', 'readings', 'sessions', 'yearPlans', 'monthPlans', 'challenges'), null);
  const library = computed(() => challengeBooks(rows()?.books ?? [], rows()?.readings ?? [], timeZone));
  const finished = computed(() => finishedBooks(rows()?.books ?? [], rows()?.readings ?? [], timeZone));
  const log = computed(() => sessionLog(rows()?.sessions ?? [], timeZone));
  const bookById = computed(() => new Map((rows()?.books ?? []).map((book) => [book.id, book])));
  return { rows, library, finished, log, bookById, today: readerToday() };
}
