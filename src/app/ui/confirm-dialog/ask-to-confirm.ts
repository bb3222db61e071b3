import { inject } from '@angular/core';
import { MatDialog } from '@angular/material/dialog';
import { firstValueFrom } from 'rxjs';

import { ConfirmDialog, type ConfirmDialogData } from './confirm-dialog';

/**
 * Asks a yes-or-no question in the confirm dialog; resolves `true` only for yes (closing it any
 * other way is no). Call in an injection context and keep the function it returns.
 */
export function askToConfirm(): (data: ConfirmDialogData) => Promise<boolean> {
  const dialog = inject(MatDialog);
  return async (data) => {
    const ref = dialog.open<ConfirmDialog, ConfirmDialogData, boolean>(ConfirmDialog, { data, width: '440px' });
    return (await firstValueFrom(ref.afterClosed())) === true;
  };
}
