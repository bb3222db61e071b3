import { computed, DestroyRef, inject, Injectable, signal, type Signal } from '@angular/core';

/**
 * Knows whether anything on screen would be lost by a reload: a form with unsaved input, an open
 * timer dialog. Updates and tab coordination ask before reloading the page.
 */
@Injectable({ providedIn: 'root' })
export class UnsavedWork {
  private readonly sources = signal<readonly Signal<boolean>[]>([]);

  /** Something would be lost by a reload now. */
  readonly present = computed(() => this.sources().some((source) => source()));

  /**
   * Registers a signal that is true while its owner holds unsaved work; it is forgotten when the
   * calling component is destroyed. Call in an injection context.
   */
  track(source: Signal<boolean>): void {
    this.sources.update((list) => [...list, source]);
    inject(DestroyRef).onDestroy(() => this.sources.update((list) => list.filter((s) => s !== source)));
  }
}
