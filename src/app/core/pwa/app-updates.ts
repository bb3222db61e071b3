import { DestroyRef, effect, inject, Injectable, signal } from '@angular/core';
import { takeUntilDestroyed } from '@angular/core/rxjs-interop';
import { MatSnackBar } from '@angular/material/snack-bar';
import { SwUpdate, type VersionReadyEvent } from '@angular/service-worker';
import { filter } from 'rxjs';

import { PAGE_RELOAD } from './page-reload';
import { VersionReady } from './version-ready';
import { UnsavedWork } from './unsaved-work';

/** Look for a new version this often while the app is open (and whenever it becomes visible). */
const CHECK_EVERY_MS = 30 * 60 * 1000;

/**
 * New versions of Lamplight: when one is ready, offers a reload in a snackbar; when the running
 * version cannot continue ("unrecoverable"), says so and reloads once the message has gone. Neither ever reloads while a
 * form holds unsaved input or a timer dialog is open: it waits until that is done.
 */
@Injectable({ providedIn: 'root' })
export class AppUpdates {
  private readonly updates = inject(SwUpdate);
  private readonly snackBar = inject(MatSnackBar);
  private readonly unsaved = inject(UnsavedWork);
  private readonly reloadWanted = signal(false);
  private readonly reload = inject(PAGE_RELOAD);

  constructor() {
    if (!this.updates.isEnabled) return;
    const destroyRef = inject(DestroyRef);
    this.updates.versionUpdates
      .pipe(
        filter((event): event is VersionReadyEvent => event.type === 'VERSION_READY'),
        takeUntilDestroyed(destroyRef),
      )
      .subscribe(() => this.offerReload());
    // Announced before this service loaded (it loads after the first screen): act on it now.
    const earlier = inject(VersionReady);
    if (earlier.seen()) this.offerReload();
    if (earlier.unrecoverable()) this.reloadAfterSaying();
    this.updates.unrecoverable.pipe(takeUntilDestroyed(destroyRef)).subscribe(() => this.reloadAfterSaying());
    // Reload as soon as it is safe, once a reload is wanted.
    effect(() => {
      if (this.reloadWanted() && !this.unsaved.present()) this.reload();
    });
    void this.check();
    const timer = setInterval(() => void this.check(), CHECK_EVERY_MS);
    const onVisible = () => globalThis.document.visibilityState === 'visible' && void this.check();
    globalThis.document?.addEventListener('visibilitychange', onVisible);
    destroyRef.onDestroy(() => {
      clearInterval(timer);
      globalThis.document?.removeEventListener('visibilitychange', onVisible);
    });
  }

  private async check(): Promise<void> {
    try {
      await this.updates.checkForUpdate();
    } catch {
      // Offline, or the server is away: the next check will do.
    }
  }

  /** Reload once the message has been read: reloading at once would take it away unseen. */
  private reloadAfterSaying(): void {
    this.snackBar
      .open('Lamplight has to reload to keep working. Your journal is safe on this device.', undefined, { duration: 6000 })
      .afterDismissed()
      .subscribe(() => this.reloadWanted.set(true));
  }

  private offerReload(): void {
    const ref = this.snackBar.open('A new version of Lamplight is ready.', 'Reload', { duration: 0 });
    ref.onAction().subscribe(() => {
      if (this.unsaved.present()) {
        this.snackBar.open('Lamplight will reload once you have saved what you are writing.', undefined, { duration: 5000 });
      }
      this.reloadWanted.set(true);
    });
  }
}
