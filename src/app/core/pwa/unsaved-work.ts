import { computed, DestroyRef, inject, Injectable, signal, type Signal } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import type { AbstractControl } from '@angular/forms';
import { map, merge } from 'rxjs';

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

  /**
   * Tracks forms: unsaved while any of them is dirty. Follows `events`, which (unlike
   * `valueChanges`) also fires when a save marks a form pristine. Call in an injection context.
   */
  trackForm(...forms: AbstractControl[]): void {
    const dirty = () => forms.some((form) => form.dirty);
    this.track(toSignal(merge(...forms.map((form) => form.events)).pipe(map(dirty)), { initialValue: dirty() }));
  }
}
