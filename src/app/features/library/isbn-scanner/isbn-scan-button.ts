import { ChangeDetectionStrategy, Component, inject, output } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';
import { firstValueFrom } from 'rxjs';

import { IsbnScanner } from './isbn-scanner';

/**
 * The "Scan" icon button beside an ISBN field: opens the scanner and hands back what it read.
 * A component of its own so a form needs one element and one handler to offer scanning.
 */
@Component({
  selector: 'll-isbn-scan-button',
  imports: [MatButtonModule, MatIconModule],
  template: `
    <button mat-icon-button type="button" aria-label="Scan the ISBN barcode" (click)="scan()">
      <mat-icon aria-hidden="true">barcode_scanner</mat-icon>
    </button>
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class IsbnScanButton {
  private readonly dialog = inject(MatDialog);

  /** The ISBN-13 digits of a book barcode the reader scanned. */
  readonly scanned = output<string>();

  protected async scan(): Promise<void> {
    const ref = this.dialog.open<IsbnScanner, void, string>(IsbnScanner, { width: '520px', maxWidth: '95vw' });
    const isbn = await firstValueFrom(ref.afterClosed());
    if (isbn) this.scanned.emit(isbn);
  }
}
