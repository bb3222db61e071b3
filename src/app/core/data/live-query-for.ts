import { inject, type Signal } from '@angular/core';
import { toObservable, toSignal } from '@angular/core/rxjs-interop';
import { combineLatest, of, switchMap } from 'rxjs';

import type { JournalDb } from './journal-db';
import { LiveQueryPace, pacedLiveQuery } from './live-query-pace';
import { LocalJournal } from './local-journal';

/**
 * A Dexie live query that follows a source signal (a route id, an input) as well as the reader's
 * database: it re-runs when the source changes and when the rows it read change, in this tab or
 * another (paced while a long pull stores pages: {@link LiveQueryPace}). `undefined` until the
 * first answer. Call in an injection context.
 *
 * @example
 * readonly id = input.required<string>();
 * private readonly data = liveQueryFor(this.id, (db, id) => bookDossier(db, id));
 */
export function liveQueryFor<S, T>(source: Signal<S>, query: (db: JournalDb, value: S) => Promise<T> | T): Signal<T | undefined> {
  const journal = inject(LocalJournal);
  const pace = inject(LiveQueryPace);
  return toSignal(
    combineLatest([toObservable(journal.db), toObservable(source)]).pipe(
      switchMap(([db, value]) => (db ? pacedLiveQuery(pace, () => query(db, value)) : of(undefined))),
    ),
  );
}
