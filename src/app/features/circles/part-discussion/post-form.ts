import { ChangeDetectionStrategy, Component, input, output } from '@angular/core';
import { FormControl, FormGroup, ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';

import { POST_MAX_LENGTH } from '@shared/circles/circle-collections';

import { fieldError } from '../../../ui/field-errors';

/** A post's text being written in place: a reply under a post, or an edit of the reader's own. */
@Component({
  selector: 'll-post-form',
  imports: [ReactiveFormsModule, MatButtonModule, MatFormFieldModule, MatInputModule],
  template: `
    <form [formGroup]="form()" (ngSubmit)="send.emit()" novalidate class="compose" [attr.aria-label]="name()">
      <mat-form-field appearance="outline">
        <mat-label>{{ label() }}</mat-label>
        <textarea matInput formControlName="text" [rows]="rows()" [maxlength]="maxLength"></textarea>
        <mat-error>{{ fieldError(form().controls.text, errorName()) }}</mat-error>
      </mat-form-field>
      <div class="row">
        <button mat-flat-button type="submit">{{ sendLabel() }}</button>
        <button mat-button type="button" (click)="cancelled.emit()">Cancel</button>
      </div>
    </form>
  `,
  styleUrl: './post-form.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PostForm {
  readonly form = input.required<FormGroup<{ text: FormControl<string> }>>();
  /** The form's accessible name ("Reply"). */
  readonly name = input.required<string>();
  readonly label = input.required<string>();
  /** How "… is required" names the text. */
  readonly errorName = input.required<string>();
  readonly sendLabel = input.required<string>();
  readonly rows = input(3);
  readonly send = output();
  readonly cancelled = output();

  protected readonly fieldError = fieldError;
  protected readonly maxLength = POST_MAX_LENGTH;
}
