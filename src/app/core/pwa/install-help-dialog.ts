import { ChangeDetectionStrategy, Component } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatDialogModule } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';

/** iPhone and iPad have no install prompt: how to add Lamplight to the Home Screen by hand. */
@Component({
  selector: 'll-install-help-dialog',
  imports: [MatDialogModule, MatButtonModule, MatIconModule],
  template: `
    <h2 mat-dialog-title>Add Lamplight to your Home Screen</h2>
    <mat-dialog-content>
      <ol>
        <li>Open Lamplight in Safari.</li>
        <li>Tap <mat-icon aria-hidden="true" inline>ios_share</mat-icon> <strong>Share</strong>.</li>
        <li>Choose <strong>Add to Home Screen</strong>, then <strong>Add</strong>.</li>
      </ol>
      <p>Opened from the Home Screen, Lamplight works with no signal, and Safari is less likely to clear its storage.</p>
    </mat-dialog-content>
    <mat-dialog-actions align="end">
      <button mat-flat-button mat-dialog-close cdkFocusInitial>Done</button>
    </mat-dialog-actions>
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class InstallHelpDialog {}
