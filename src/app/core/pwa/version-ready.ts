import { Injectable, inject, signal } from '@angular/core';
import { takeUntilDestroyed } from '@angular/core/rxjs-interop';
import { SwUpdate } from '@angular/service-worker';

/**
 * Whether the service worker has said a new version is ready, or that this one cannot go on.
 * Listens from the start: the update prompts (`AppUpdates`, with the snackbar) load only when one
 * of these happens or the app has been open a while, and the worker's own check on navigation can
 * announce a version before they listen (its events are not replayed).
 */
@Injectable({ providedIn: 'root' })
export class VersionReady {
  readonly seen = signal(false);
  readonly unrecoverable = signal(false);

  constructor() {
    const updates = inject(SwUpdate);
    if (!updates.isEnabled) return;
    updates.versionUpdates.pipe(takeUntilDestroyed()).subscribe((event) => {
      if (event.type === 'VERSION_READY') this.seen.set(true);
    });
    updates.unrecoverable.pipe(takeUntilDestroyed()).subscribe(() => this.unrecoverable.set(true));
  }
}
