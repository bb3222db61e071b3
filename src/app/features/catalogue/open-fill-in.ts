import { inject, Injectable } from '@angular/core';
import { MatDialog } from '@angular/material/dialog';
import { firstValueFrom } from 'rxjs';

import { FillInDialog, type FillInData, type FillInResult } from './fill-in-dialog/fill-in-dialog';

/** Opens "Details from the catalogue" and answers the fields the reader chose (empty when none). */
@Injectable({ providedIn: 'root' })
export class OpenFillIn {
  private readonly dialog = inject(MatDialog);

  async choose(data: FillInData): Promise<FillInResult> {
    const ref = this.dialog.open<FillInDialog, FillInData, FillInResult>(FillInDialog, { data, width: '560px', maxWidth: '95vw', autoFocus: 'first-tabbable' });
    const chosen: unknown = await firstValueFrom(ref.afterClosed());
    // Cancel (mat-dialog-close) closes with '', Escape with undefined: both mean "nothing".
    return typeof chosen === 'object' && chosen !== null ? (chosen as FillInResult) : {};
  }
}
