import { DestroyRef, effect, inject, Injectable } from '@angular/core';
import { MatSnackBar } from '@angular/material/snack-bar';

import { LocalJournal } from '../data/local-journal';
import { PAGE_RELOAD } from './page-reload';
import { UnsavedWork } from './unsaved-work';

/**
 * Keeps tabs from getting stuck on a schema upgrade: a tab whose database was closed by a newer
 * tab says so and reloads (once nothing unsaved is on screen); a tab waiting on an older one asks
 * the reader to close it.
 */
@Injectable({ providedIn: 'root' })
export class TabCoordination {
  constructor() {
    const journal = inject(LocalJournal);
    const unsaved = inject(UnsavedWork);
    const snackBar = inject(MatSnackBar);
    const reload = inject(PAGE_RELOAD);
    let told = false;
    let timer: ReturnType<typeof setTimeout> | undefined;
    inject(DestroyRef).onDestroy(() => clearTimeout(timer));
    effect(() => {
      if (!journal.replacedElsewhere()) return;
      if (!told) {
        told = true;
        snackBar
          .open('Lamplight was updated in another tab, so this tab reloads to keep up.', 'Reload now', { duration: 0 })
          .onAction()
          .subscribe(() => reload());
      }
      clearTimeout(timer);
      if (!unsaved.present()) timer = setTimeout(reload, 2500);
    });
    effect(() => {
      if (journal.upgradeBlocked()) {
        snackBar.open('Close other Lamplight tabs to finish updating this one.', undefined, { duration: 8000 });
      }
    });
  }
}
