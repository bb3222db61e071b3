import { inject, type Signal } from '@angular/core';
import { toObservable, toSignal } from '@angular/core/rxjs-interop';
import { of, switchMap } from 'rxjs';

import type { JournalDb } from './journal-db';
import { LiveQueryPace, pacedLiveQuery } from './live-query-pace';
import { LocalJournal } from './local-journal';

/**
 * A Dexie live query as a signal: re-runs when the rows it read change, in this tab or another,
 * and follows the signed-in reader's database; paced while a long pull stores pages
 * ({@link LiveQueryPace}). Call in an injection context.
 *
 * @example
 * protected readonly books = liveQuerySignal((db) => db.rows('books').toArray(), []);
 */
export function liveQuerySignal<T>(query: (db: JournalDb) => Promise<T> | T, initial: T): Signal<T> {
  const journal = inject(LocalJournal);
  const pace = inject(LiveQueryPace);
  return toSignal(toObservable(journal.db).pipe(switchMap((db) => (db ? pacedLiveQuery(pace, () => query(db)) : of(initial)))), {
    initialValue: initial,
  });
}
