import { ChangeDetectionStrategy, Component, input, output } from '@angular/core';
import { FormControl, FormGroup, ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';

/** The longest line an "add another" form takes. */
const MAX_LENGTH = 300;

/**
 * One line and an Add button under a list ("Another prompt", "Another reading goal"). Adding
 * sends the line trimmed (at most 300 characters) and empties the field; a blank line adds nothing.
 */
@Component({
  selector: 'll-add-line',
  imports: [ReactiveFormsModule, MatButtonModule, MatFormFieldModule, MatInputModule],
  template: `
    <form [formGroup]="form" (ngSubmit)="add()">
      <mat-form-field appearance="outline" subscriptSizing="dynamic">
        <mat-label>{{ label() }}</mat-label>
        <input matInput formControlName="text" [maxlength]="maxLength" autocomplete="off" />
      </mat-form-field>
      <button mat-stroked-button type="submit">Add</button>
    </form>
  `,
  styleUrl: './add-line.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class AddLine {
  readonly label = input.required<string>();
  /** The trimmed line, never blank. */
  readonly added = output<string>();

  protected readonly form = new FormGroup({ text: new FormControl('', { nonNullable: true }) });
  protected readonly maxLength = MAX_LENGTH;

  protected add(): void {
    const line = this.form.controls.text.value.trim().slice(0, MAX_LENGTH);
    if (!line) return;
    this.form.reset();
    this.added.emit(line);
  }
}
