import type { Signal } from '@angular/core';

import type { StoredCover } from '../data/journal-db';
import { liveQueryFor } from '../data/live-query-for';

/**
 * The stored cover for an id, live (a download or an upload finishing shows at once): `null`
 * when there is no id or this device does not have it, `undefined` while first reading (or
 * while nobody is signed in). Call in an injection context.
 */
export function liveCover(coverId: Signal<string | null | undefined>): Signal<StoredCover | null | undefined> {
  return liveQueryFor(coverId, async (db, id) => (id ? ((await db.covers.get(id)) ?? null) : null));
}
