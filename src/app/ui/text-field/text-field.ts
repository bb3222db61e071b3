import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { FormControl, ReactiveFormsModule } from '@angular/forms';
import { MatFormFieldModule, type SubscriptSizing } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';

import { checkOnFormEvents } from '../check-on-form-events';
import { fieldError } from '../field-errors';

/**
 * One line of text in an outlined field: its label, an optional hint, and the first error
 * in the reader's words (`fieldError`, naming the field `errorName`). It shows errors the way a
 * plain field does: once touched, or once its form is submitted.
 */
@Component({
  selector: 'll-text-field',
  imports: [ReactiveFormsModule, MatFormFieldModule, MatInputModule],
  template: `
    <mat-form-field appearance="outline" [subscriptSizing]="subscriptSizing()">
      <mat-label>{{ label() }}</mat-label>
      <input matInput [type]="type()" [formControl]="control()" [attr.autocomplete]="autocomplete()" [attr.inputmode]="inputmode()" />
      @if (hint()) {
        <mat-hint>{{ hint() }}</mat-hint>
      }
      <mat-error>{{ error(control(), errorName()) }}</mat-error>
    </mat-form-field>
  `,
  styleUrl: '../field-host.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class TextField {
  readonly control = input.required<FormControl<string>>();
  readonly label = input.required<string>();
  /** How "… is required" names the field: often shorter than the label. */
  readonly errorName = input.required<string>();
  readonly hint = input<string>();
  /** Text kinds only: a number field needs Angular's number accessor, chosen by a fixed `type`. */
  readonly type = input<'text' | 'url' | 'email' | 'password' | 'tel'>('text');
  /** Off unless asked: these fields hold the reader's own words, not a browser's guesses. */
  readonly autocomplete = input<string | undefined>('off');
  readonly inputmode = input<'numeric' | 'decimal' | 'email' | 'tel' | 'url'>();
  readonly subscriptSizing = input<SubscriptSizing>('fixed');

  protected readonly error = fieldError;

  constructor() {
    checkOnFormEvents(this.control);
  }
}
