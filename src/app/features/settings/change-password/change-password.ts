import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { FormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';

import { Auth } from '../../../core/auth/auth';
import { TextField } from '../../../ui/text-field/text-field';
import { FormSubmission } from '../../../ui/form-submission';
import { passwordPolicy } from '../../../ui/password-validator';
import { AccountApi } from '../../../core/auth/account-api';

/** Change the password; other devices are signed out, this one stays signed in. */
@Component({
  selector: 'll-change-password',
  imports: [ReactiveFormsModule, MatButtonModule, TextField],
  templateUrl: './change-password.html',
  // One field per row with room between them: a hint or an error never touches the next field.
  styles: `
    .stack {
      display: flex;
      flex-direction: column;
      gap: 16px;
      max-width: 420px;
    }
    .stack p {
      margin: 0;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ChangePassword {
  private readonly api = inject(AccountApi);
  private readonly auth = inject(Auth);

  protected readonly form = inject(FormBuilder).nonNullable.group({
    currentPassword: ['', Validators.required],
    newPassword: ['', [Validators.required, passwordPolicy(() => ({ email: this.auth.user()?.email, displayName: this.auth.user()?.displayName }))]],
  });
  protected readonly message = signal('');
  protected readonly submission = new FormSubmission();

  protected async changePassword(): Promise<void> {
    this.message.set('');
    if (await this.submission.submit(this.form, () => this.api.changePassword(this.form.getRawValue()))) {
      this.form.reset();
      this.message.set('Password changed. Your other devices were signed out and will ask for it.');
    }
  }
}
