import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { FormControl } from '@angular/forms';

import { ChoiceField } from '../choice-field/choice-field';

/** A row a reader can choose; its id is the field's value. */
export interface ChoosableRow {
  readonly id: string;
  readonly title?: string | null;
}

/**
 * One of the reader's rows (a book, a quote) as a {@link ChoiceField}, its value the row's id.
 * The first option, with the empty value, is `none` ("Choose a book"). Options read as the row's
 * title unless `text` says otherwise.
 */
@Component({
  selector: 'll-row-choice-field',
  imports: [ChoiceField],
  template: `<ll-choice-field [control]="control()" [label]="label()" [choices]="ids()" [words]="words()" [none]="none()" [hint]="hint()" />`,
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

  protected readonly ids = computed(() => this.rows().map((row) => row.id));
  protected readonly words = computed(() => Object.fromEntries(this.rows().map((row) => [row.id, this.text()(row)])));
}
