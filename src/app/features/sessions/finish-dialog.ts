import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule } from '@angular/material/dialog';

/** What the dialog says. */
export interface FinishDialogData {
  readonly title: string;
}

/** Asks whether a book whose end the reader reached is finished; closes with true for yes. */
@Component({
  selector: 'll-finish-dialog',
  imports: [MatDialogModule, MatButtonModule],
  template: `
    <h2 mat-dialog-title>Mark it finished?</h2>
    <mat-dialog-content>
      <p>You reached the end of {{ data.title || 'this book' }}.</p>
    </mat-dialog-content>
    <mat-dialog-actions align="end">
      <button mat-button type="button" [mat-dialog-close]="false">Not yet</button>
      <button mat-flat-button type="button" [mat-dialog-close]="true" cdkFocusInitial>Mark finished</button>
    </mat-dialog-actions>
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class FinishDialog {
  protected readonly data = inject<FinishDialogData>(MAT_DIALOG_DATA);
}
