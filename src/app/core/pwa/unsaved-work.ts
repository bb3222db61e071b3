import { computed, DestroyRef, DOCUMENT, effect, inject, Injectable, InjectionToken, signal, type Signal } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import type { AbstractControl } from '@angular/forms';
import { firstValueFrom, map, merge } from 'rxjs';

import { LazyOverlays } from '../../ui/lazy-overlays';
import type { LeaveDialog } from './leave-dialog';

/**
 * Where `beforeunload` arrives: the window. A token, so unit tests (which run inside one page, whose
 * test runner watches that event) can send it somewhere else.
 */
export const UNLOAD_EVENTS = new InjectionToken<EventTarget | null>('beforeunload events', {
  providedIn: 'root',
  factory: () => inject(DOCUMENT).defaultView,
});

/**
 * Knows whether anything on screen would be lost by a reload or by leaving the page: a form with
 * unsaved input, an open timer dialog. Updates and tab coordination ask before reloading the page,
 * `unsavedWorkGuard` before the router leaves it, and the browser (`beforeunload`) before the tab
 * closes or reloads.
 */
@Injectable({ providedIn: 'root' })
export class UnsavedWork {
  private readonly sources = signal<readonly Signal<boolean>[]>([]);
  private readonly overlays = inject(LazyOverlays);
  private asking: Promise<boolean> | null = null;

  /** Something would be lost by a reload now. */
  readonly present = computed(() => this.sources().some((source) => source()));

  constructor() {
    // The browser's own prompt, only while there is something to lose.
    const target = inject(UNLOAD_EVENTS);
    effect((onCleanup) => {
      if (!target || !this.present()) return;
      const warn = (event: Event) => {
        event.preventDefault();
        (event as BeforeUnloadEvent).returnValue = true; // browsers before the standard preventDefault() (Chrome < 119)
      };
      target.addEventListener('beforeunload', warn);
      onCleanup(() => target.removeEventListener('beforeunload', warn));
    });
  }

  /**
   * Registers a signal that is true while its owner holds unsaved work; it is forgotten when the
   * calling component is destroyed. Call in an injection context.
   */
  track(source: Signal<boolean>): void {
    this.sources.update((list) => [...list, source]);
    inject(DestroyRef).onDestroy(() => this.sources.update((list) => list.filter((s) => s !== source)));
  }

  /**
   * Tracks forms: unsaved while any of them is dirty. Follows `events`, which (unlike
   * `valueChanges`) also fires when a save marks a form pristine. Call in an injection context.
   */
  trackForm(...forms: AbstractControl[]): void {
    const dirty = () => forms.some((form) => form.dirty);
    this.track(toSignal(merge(...forms.map((form) => form.events)).pipe(map(dirty)), { initialValue: dirty() }));
  }

  /** True at once when nothing is unsaved; otherwise asks the reader, true for "Leave". */
  mayLeave(): Promise<boolean> {
    if (!this.present()) return Promise.resolve(true);
    // One question at a time: a second navigation (Back while asking) waits for the same answer.
    this.asking ??= this.ask().then((answer) => {
      this.asking = null;
      return answer === true;
    });
    return this.asking;
  }

  private async ask(): Promise<boolean | undefined> {
    const { LeaveDialog } = await import('./leave-dialog');
    const ref = await this.overlays.dialog<LeaveDialog, void, boolean>(LeaveDialog, { width: '400px', maxWidth: '95vw', closeOnNavigation: false });
    return firstValueFrom(ref.afterClosed());
  }
}
