import type { Signal } from '@angular/core';
import { inject } from '@angular/core';
import { toObservable, toSignal } from '@angular/core/rxjs-interop';
import { liveQuery } from 'dexie';
import { combineLatest, from, of, switchMap } from 'rxjs';

import type { StoredCover } from '../data/journal-db';
import { LocalJournal } from '../data/local-journal';

/**
 * The stored cover for an id, live (a download or an upload finishing shows at once): `null`
 * when there is no id or this device does not have it, `undefined` while first reading. Call in
 * an injection context.
 */
export function liveCover(coverId: Signal<string | null | undefined>): Signal<StoredCover | null | undefined> {
  const journal = inject(LocalJournal);
  return toSignal(
    combineLatest([toObservable(journal.db), toObservable(coverId)]).pipe(
      switchMap(([db, id]) => (db && id ? from(liveQuery(async () => (await db.covers.get(id)) ?? null)) : of(null))),
    ),
    { initialValue: undefined },
  );
}
