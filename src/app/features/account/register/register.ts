import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { FormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { Router, RouterLink } from '@angular/router';

import { DISPLAY_NAME_MAX_LENGTH } from '@shared/account/display-name';
import { PASSWORD_MIN_LENGTH } from '@shared/account/password-policy';

import { Auth } from '../../../core/auth/auth';
import { AccountPage } from '../account-page/account-page';
import { fieldError } from '../../../ui/field-errors';
import { BusyBar } from '../../../ui/busy-bar/busy-bar';
import { TextField } from '../../../ui/text-field/text-field';
import { FormSubmission } from '../../../ui/form-submission';
import { passwordPolicy } from '../../../ui/password-validator';

/** Create an account: e-mail, a name to show and a long password (no composition rules). */
@Component({
  selector: 'll-register',
  imports: [ReactiveFormsModule, RouterLink, MatButtonModule, MatFormFieldModule, MatInputModule, AccountPage, BusyBar, TextField],
  templateUrl: './register.html',
  styleUrl: '../account-form.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Register {
  private readonly auth = inject(Auth);
  private readonly router = inject(Router);

  private readonly fb = inject(FormBuilder).nonNullable;
  private readonly displayName = this.fb.control('', [Validators.required, Validators.maxLength(DISPLAY_NAME_MAX_LENGTH)]);
  private readonly email = this.fb.control('', [Validators.required, Validators.email]);
  protected readonly form = this.fb.group({
    displayName: this.displayName,
    email: this.email,
    // The policy also refuses a password made of the reader's own name or address.
    password: this.fb.control('', [Validators.required, passwordPolicy(() => ({ email: this.email.value, displayName: this.displayName.value }))]),
  });
  protected readonly submission = new FormSubmission();
  protected readonly minLength = PASSWORD_MIN_LENGTH;
  protected readonly fieldError = fieldError;

  protected async register(): Promise<void> {
    const { email, password, displayName } = this.form.getRawValue();
    if (await this.submission.submit(this.form, () => this.auth.register(email, password, displayName))) {
      await this.router.navigateByUrl('/today');
    }
  }
}
