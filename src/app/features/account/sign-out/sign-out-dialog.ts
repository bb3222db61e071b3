import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule } from '@angular/material/dialog';

/** What the dialog knows when it opens. */
export interface SignOutDialogData {
  readonly pendingChanges: number;
}

/** The reader's choice: keep this device's copy of the journal, or erase it. */
export type SignOutChoice = 'keep' | 'erase';

/** Asks whether to keep or erase the local copy, warning about changes not yet synced. */
@Component({
  selector: 'll-sign-out-dialog',
  imports: [MatDialogModule, MatButtonModule],
  templateUrl: './sign-out-dialog.html',
  styleUrl: './sign-out-dialog.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SignOutDialog {
  protected readonly data = inject<SignOutDialogData>(MAT_DIALOG_DATA);
}
