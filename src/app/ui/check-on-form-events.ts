import { ChangeDetectorRef, effect, inject } from '@angular/core';
import { takeUntilDestroyed } from '@angular/core/rxjs-interop';
import { type AbstractControl, FormGroupDirective } from '@angular/forms';

/**
 * For an OnPush component that shows fields of its parent's form: an error can come from outside
 * its view (the form submitted, a server's reason, markAllAsTouched), so look again on every event
 * of `control` and when the form is submitted, as fields in the page's own template would. Call it
 * in the constructor.
 */
export function checkOnFormEvents(control: () => AbstractControl): void {
  const view = inject(ChangeDetectorRef);
  inject(FormGroupDirective, { optional: true })
    ?.ngSubmit.pipe(takeUntilDestroyed())
    .subscribe(() => view.markForCheck());
  effect((onCleanup) => {
    const events = control().events.subscribe(() => view.markForCheck());
    onCleanup(() => events.unsubscribe());
  });
}
