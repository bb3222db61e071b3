import { computed, type Signal } from '@angular/core';

import { booksFinishedIn } from '@shared/challenges/books-finished-in';
import { yearPeriod } from '@shared/goals/amounts-in';
import type { Book } from '@shared/sync/schema/collections';

import { goalRecord, type GoalRecord } from '../../core/read-model/goal-rows';

/** The reader's journal as the insights of one year read it. */
export interface InsightsYear {
  readonly record: GoalRecord;
  readonly loaded: Signal<boolean>;
  /** The year shown, or null for a route that names no year we keep. */
  readonly year: Signal<number | null>;
  /** The books finished that year, earliest first. */
  readonly books: Signal<readonly Book[]>;
}

/**
 * The journal for the year in `yearText` ('2026'; the current year when undefined). Call in an
 * injection context (a component's fields).
 */
export function insightsYear(yearText: Signal<string | undefined>): InsightsYear {
  const record = goalRecord();
  const year = computed(() => {
    const text = yearText();
    if (text === undefined) return Number(record.today.slice(0, 4));
    return /^\d{4}$/.test(text) && Number(text) >= 1900 && Number(text) <= 3000 ? Number(text) : null;
  });
  const books = computed(() => {
    const shown = year();
    if (shown === null) return [];
    const byId = record.bookById();
    return booksFinishedIn(record.finished(), yearPeriod(shown))
      .map((book) => byId.get(book.id))
      .filter((book): book is Book => book !== undefined);
  });
  return { record, loaded: computed(() => record.rows() !== null), year, books };
}
