import { TestBed } from '@angular/core/testing';

import { patiently } from '../../../core/testing/patience';

/** Waits until a condition holds: Dexie live queries (and what shows them) answer asynchronously. */
export async function until(condition: () => boolean, what = 'the live query'): Promise<void> {
  await patiently(what, condition, () => TestBed.tick());
}
