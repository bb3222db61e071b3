import { inject, type Signal } from '@angular/core';
import { toObservable, toSignal } from '@angular/core/rxjs-interop';
import { liveQuery } from 'dexie';
import { from, of, switchMap } from 'rxjs';

import type { JournalDb } from './journal-db';
import { LocalJournal } from './local-journal';

/**
 * A Dexie live query as a signal: re-runs when the rows it read change, in this tab or another,
 * and follows the signed-in reader's database. Call in an injection context.
 *
 * @example
 * protected readonly books = liveQuerySignal((db) => db.rows('books').toArray(), []);
 */
export function liveQuerySignal<T>(query: (db: JournalDb) => Promise<T> | T, initial: T): Signal<T> {
  const journal = inject(LocalJournal);
  return toSignal(toObservable(journal.db).pipe(switchMap((db) => (db ? from(liveQuery(() => query(db))) : of(initial)))), {
    initialValue: initial,
  });
}
