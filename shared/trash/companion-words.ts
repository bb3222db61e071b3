import type { CollectionName } from '../sync/schema/collections';

/** The words for a number of rows of a kind that go with a delete: one and many. */
const WORDS: Partial<Record<CollectionName, readonly [string, string]>> = {
  readings: ['reading', 'readings'],
  sessions: ['session', 'sessions'],
  quotes: ['quote', 'quotes'],
  bookStatusChanges: ['status change', 'status changes'],
  notebookPages: ['page', 'pages'],
};

/** British English lists: "a, b and c". */
const LIST = new Intl.ListFormat('en-GB', { type: 'conjunction', style: 'long' });

/** "3 sessions" or "1 quote". */
export function countWords(collection: CollectionName, count: number): string {
  const [one, many] = WORDS[collection] ?? ['item', 'items'];
  return `${count} ${count === 1 ? one : many}`;
}

/**
 * What goes with a delete, in one line: "2 readings, 5 sessions and 1 quote", kinds with none
 * left out; empty when nothing goes with it.
 */
export function companionLine(counts: readonly { readonly collection: CollectionName; readonly count: number }[]): string {
  const parts = counts.filter(({ count }) => count > 0).map(({ collection, count }) => countWords(collection, count));
  return LIST.format(parts);
}
