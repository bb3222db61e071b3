import { ChangeDetectionStrategy, Component, inject, model } from '@angular/core';
import { MatChipsModule } from '@angular/material/chips';
import { MatIconModule } from '@angular/material/icon';

import { LabelDirectory } from '../../core/read-model/label-directory';

/** Choose labels by toggling chips; the value is the list of chosen label ids. */
@Component({
  selector: 'll-label-picker',
  imports: [MatChipsModule, MatIconModule],
  template: `
    <mat-chip-listbox multiple [attr.aria-label]="'Labels'" (change)="labelIds.set($event.value)" [value]="labelIds()">
      @for (label of directory.all(); track label.id) {
        <mat-chip-option [value]="label.id" [attr.data-colour]="label.colour">
          <mat-icon matChipAvatar aria-hidden="true">{{ label.icon }}</mat-icon>{{ label.name }}
        </mat-chip-option>
      }
    </mat-chip-listbox>
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LabelPicker {
  protected readonly directory = inject(LabelDirectory);
  /** The chosen label ids (two-way). */
  readonly labelIds = model<readonly string[]>([]);
}
