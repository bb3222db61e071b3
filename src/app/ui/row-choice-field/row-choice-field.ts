import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { FormControl, ReactiveFormsModule } from '@angular/forms';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';

/** A row a reader can choose: its id is the value, `text` what the option reads. */
export interface ChoosableRow {
  readonly id: string;
  readonly title?: string | null;
}

/**
 * One of the reader's rows (a book, a quote) as a native select in an outlined field, its value
 * the row's id. The first option, with the empty value, is `none` ("Choose a book"). Options
 * read as the row's title unless `text` says otherwise.
 */
@Component({
  selector: 'll-row-choice-field',
  imports: [ReactiveFormsModule, MatFormFieldModule, MatInputModule],
  template: `
    <mat-form-field appearance="outline">
      <mat-label>{{ label() }}</mat-label>
      <select matNativeControl [formControl]="control()">
        <option value="">{{ none() }}</option>
        @for (row of rows(); track row.id) {
          <option [value]="row.id">{{ text()(row) }}</option>
        }
      </select>
      @if (hint()) {
        <mat-hint>{{ hint() }}</mat-hint>
      }
    </mat-form-field>
  `,
  styleUrl: '../field-host.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class RowChoiceField<R extends ChoosableRow> {
  readonly control = input.required<FormControl<string>>();
  readonly label = input.required<string>();
  readonly rows = input.required<readonly R[]>();
  readonly none = input.required<string>();
  readonly text = input<(row: R) => string>((row) => row.title ?? '');
  readonly hint = input<string>();
}
