import { afterRenderEffect, signal, type Signal } from '@angular/core';

/** What is needed of `MatMenuTrigger`, named without importing it (that would load the menu eagerly). */
export interface MenuTriggerLike {
  openMenu(): void;
  focus(origin?: 'mouse' | 'keyboard' | 'program'): void;
}

/**
 * A menu whose code (Material's menu and the CDK overlay, ~20 KB gzip) loads when its button is
 * first used. The template wraps the real trigger and its `<mat-menu>` in `@defer (on interaction)`
 * with a look-alike placeholder button whose click calls the function returned here; once the
 * real trigger renders (found by `trigger`, a `viewChild` of its `#name="matMenuTrigger"`), it
 * takes the focus and opens, so that first click or Enter still opens the menu. Call in an
 * injection context.
 */
export function deferredMenu(trigger: Signal<MenuTriggerLike | undefined>): () => void {
  const wanted = signal(false);
  afterRenderEffect(() => {
    const real = trigger();
    if (!real || !wanted()) return;
    wanted.set(false);
    real.focus('program');
    real.openMenu();
  });
  return () => wanted.set(true);
}
