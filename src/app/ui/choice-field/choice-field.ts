import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { FormControl, ReactiveFormsModule } from '@angular/forms';
import { MatFormFieldModule, type SubscriptSizing } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';

/** The ratings a reader can give: half stars from 0.5 to 5, as the forms hold them (text). */
export const RATING_CHOICES = ['0.5', '1', '1.5', '2', '2.5', '3', '3.5', '4', '4.5', '5'] as const;

/** "1 star", "3.5 stars". */
export const RATING_WORDS: Readonly<Record<string, string>> = Object.fromEntries(
  RATING_CHOICES.map((rating) => [rating, `${rating} ${rating === '1' ? 'star' : 'stars'}`]),
);

/**
 * One choice from a short fixed list, as a native select in an outlined field (native, so a phone
 * shows its own picker). `none` adds a first option with the empty value for "not chosen"; `hint`
 * shows under the field.
 */
@Component({
  selector: 'll-choice-field',
  imports: [ReactiveFormsModule, MatFormFieldModule, MatInputModule],
  template: `
    <mat-form-field appearance="outline" [subscriptSizing]="subscriptSizing()">
      <mat-label>{{ label() }}</mat-label>
      <select matNativeControl [formControl]="control()">
        @if (none() !== undefined) {
          <option value="">{{ none() }}</option>
        }
        @for (choice of choices(); track choice) {
          <option [value]="choice">{{ words()[choice] ?? choice }}</option>
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
export class ChoiceField<T extends string> {
  readonly control = input.required<FormControl<T>>();
  readonly label = input.required<string>();
  readonly choices = input.required<readonly T[]>();
  /** What each choice reads as; a choice without words shows as it is. */
  readonly words = input<Readonly<Partial<Record<T, string>>>>({} as Partial<Record<T, string>>);
  /** The words of the empty first option, if there is one. */
  readonly none = input<string>();
  readonly hint = input<string>();
  readonly subscriptSizing = input<SubscriptSizing>('fixed');
}
