import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { FormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { RouterLink } from '@angular/router';

import { PASSWORD_MIN_LENGTH } from '@shared/account/password-policy';

import { AccountPage } from '../account-page/account-page';
import { fieldError } from '../../../ui/field-errors';
import { FormSubmission } from '../../../ui/form-submission';
import { passwordPolicy } from '../../../ui/password-validator';
import { AccountApi } from '../../../core/auth/account-api';

/**
 * The page a reset link opens. The token travels in the URL fragment (`#token=…`), which
 * browsers never send to a server, and is read here only.
 */
@Component({
  selector: 'll-reset-password',
  imports: [ReactiveFormsModule, RouterLink, MatButtonModule, MatFormFieldModule, MatInputModule, AccountPage],
  templateUrl: './reset-password.html',
  styleUrl: '../account-form.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ResetPassword {
  private readonly api = inject(AccountApi);

  protected readonly token = new URLSearchParams(globalThis.location?.hash.slice(1) ?? '').get('token') ?? '';
  protected readonly form = inject(FormBuilder).nonNullable.group({
    newPassword: ['', [Validators.required, passwordPolicy()]],
  });
  protected readonly done = signal(false);
  protected readonly submission = new FormSubmission();
  protected readonly minLength = PASSWORD_MIN_LENGTH;
  protected readonly fieldError = fieldError;

  protected async choosePassword(): Promise<void> {
    const sent = await this.submission.submit(this.form, () => this.api.confirmPasswordReset({ token: this.token, ...this.form.getRawValue() }));
    this.done.set(sent);
  }
}
