import { DestroyRef, EnvironmentInjector, inject, Injectable } from '@angular/core';
import type { ComponentType } from '@angular/cdk/portal';
import type { MatDialogConfig, MatDialogRef } from '@angular/material/dialog';
import type { MatSnackBarConfig, MatSnackBarRef, TextOnlySnackBar } from '@angular/material/snack-bar';

/**
 * Material's dialog and snack bar, loaded when one is first opened: with the CDK overlay they
 * weigh ~25 KB gzip, which the first screen does without. They come from the root injector, so a
 * spec that provides or spies on `MatDialog` / `MatSnackBar` still sees every call. A dialog's
 * component should be imported dynamically too (`await import('./x-dialog')`), or its
 * `MatDialogModule` brings the overlay back into the caller's chunk. Once the app is torn down
 * (a spec's end) while one loads, it never opens: its promise stays pending.
 */
@Injectable({ providedIn: 'root' })
export class LazyOverlays {
  private readonly injector = inject(EnvironmentInjector);
  private destroyed = false;

  constructor() {
    inject(DestroyRef).onDestroy(() => (this.destroyed = true));
  }

  /** `MatSnackBar.open`, once the snack bar has loaded. */
  async snackBar(message: string, action?: string, config?: MatSnackBarConfig): Promise<MatSnackBarRef<TextOnlySnackBar>> {
    const { MatSnackBar } = await import('@angular/material/snack-bar');
    if (this.destroyed) return never();
    return this.injector.get(MatSnackBar).open(message, action, config);
  }

  /** `MatDialog.open`, once the dialog service has loaded. */
  async dialog<T, D = unknown, R = unknown>(component: ComponentType<T>, config?: MatDialogConfig<D>): Promise<MatDialogRef<T, R>> {
    const { MatDialog } = await import('@angular/material/dialog');
    if (this.destroyed) return never();
    return this.injector.get(MatDialog).open<T, D, R>(component, config);
  }
}

const never = <T>(): Promise<T> => new Promise<T>(() => undefined);
