import { DestroyRef, effect, inject, Injectable } from '@angular/core';

import { LazyOverlays } from '../../ui/lazy-overlays';
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
    const overlays = inject(LazyOverlays);
    const reload = inject(PAGE_RELOAD);
    let told = false;
    let timer: ReturnType<typeof setTimeout> | undefined;
    inject(DestroyRef).onDestroy(() => clearTimeout(timer));
    effect(() => {
      if (!journal.replacedElsewhere()) return;
      if (!told) {
        told = true;
        void overlays
          .snackBar('Lamplight was updated in another tab, so this tab reloads to keep up.', 'Reload now', { duration: 0 })
          .then((ref) => ref.onAction().subscribe(() => reload()));
      }
      clearTimeout(timer);
      if (!unsaved.present()) timer = setTimeout(reload, 2500);
    });
    effect(() => {
      if (journal.upgradeBlocked()) {
        void overlays.snackBar('Close other Lamplight tabs to finish updating this one.', undefined, { duration: 8000 });
      }
    });
  }
}
