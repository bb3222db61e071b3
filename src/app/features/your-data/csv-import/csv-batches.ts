import type { CsvAddition } from '@shared/import/csv/csv-dry-run';

import type { RowWrite } from '../../../core/data/journal-store';

/** Rows written per Dexie transaction: a cancelled import keeps whole batches only; small enough that one batch (about 150 row writes) stays a short task. */
export const CSV_ROWS_PER_BATCH = 50;

/** A row's writes: the book, its first status change and, when it has any, its reading. */
export function additionWrites({ book, reading }: CsvAddition, now: string): RowWrite[] {
  const bookId = crypto.randomUUID();
  const finishedOn = reading?.['finishedOn'] as string | null | undefined;
  const changedAt = finishedOn ? `${finishedOn}T12:00:00.000Z` : now;
  return [
    { collection: 'books', rowId: bookId, patch: { ...book, statusChangedAt: changedAt } },
    { collection: 'bookStatusChanges', rowId: crypto.randomUUID(), patch: { bookId, status: book['status'], changedAt, deleted: false } },
    ...(reading ? [{ collection: 'readings' as const, rowId: crypto.randomUUID(), patch: { ...reading, bookId } }] : []),
  ];
}
