import { inject } from '@angular/core';

import type { CollectionName } from '@shared/sync/schema/collections';

import { Deletions } from '../core/trash/deletions';
import { LazyOverlays } from './lazy-overlays';

/** How long "Undo" stays on offer after a delete. */
export const UNDO_OFFER_MS = 8000;

/**
 * The one way a screen deletes something: a tombstone written with what goes with it
 * (`Deletions.remove`), then a snack bar saying what went whose "Undo" restores them together.
 * Trash (Settings) is the safety net once the snack bar is gone. Call in an injection context
 * and keep the function it returns.
 *
 * @example
 * private readonly deleteWithUndo = undoableDelete();
 * await this.deleteWithUndo('quotes', id, 'Quote deleted.');
 */
export function undoableDelete(): (collection: CollectionName, id: string, message: string) => Promise<void> {
  const deletions = inject(Deletions);
  const overlays = inject(LazyOverlays);
  return async (collection, id, message) => {
    await deletions.remove(collection, id);
    const ref = await overlays.snackBar(message, 'Undo', { duration: UNDO_OFFER_MS });
    ref.onAction().subscribe(() => void deletions.restore(collection, id));
  };
}
