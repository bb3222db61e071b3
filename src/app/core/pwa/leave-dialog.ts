import { ChangeDetectionStrategy, Component } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatDialogModule } from '@angular/material/dialog';

/** Asks before leaving a page with unsaved changes; closes with `true` for "Leave". */
@Component({
  selector: 'll-leave-dialog',
  imports: [MatDialogModule, MatButtonModule],
  template: `
    <h2 mat-dialog-title>Leave without saving?</h2>
    <mat-dialog-content><p>Your changes to this page are not saved yet.</p></mat-dialog-content>
    <mat-dialog-actions align="end">
      <button mat-button type="button" [mat-dialog-close]="true">Leave</button>
      <button mat-flat-button type="button" [mat-dialog-close]="false" cdkFocusInitial>Keep editing</button>
    </mat-dialog-actions>
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LeaveDialog {}
