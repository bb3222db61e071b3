import { inject } from '@angular/core';
import { MatSnackBar } from '@angular/material/snack-bar';

/** How long "Undo" stays on offer after a delete. */
export const UNDO_OFFER_MS = 8000;

/**
 * The one way a delete offers "Undo": a snack bar saying what went, whose action runs `restore`
 * (usually writing `deleted: false` back, since rows are only ever marked deleted). Call in an
 * injection context; keep the function it returns.
 *
 * @example
 * private readonly offerUndo = offerUndo();
 * this.offerUndo('Quote deleted.', () => this.store.write('quotes', id, { deleted: false }));
 */
export function offerUndo(): (message: string, restore: () => Promise<unknown>) => void {
  const snackBar = inject(MatSnackBar);
  return (message, restore) => {
    snackBar
      .open(message, 'Undo', { duration: UNDO_OFFER_MS })
      .onAction()
      .subscribe(() => void restore());
  };
}
