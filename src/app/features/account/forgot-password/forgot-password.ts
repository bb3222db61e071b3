import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { FormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { RouterLink } from '@angular/router';

import { AccountPage } from '../account-page/account-page';
import { TextField } from '../../../ui/text-field/text-field';
import { FormSubmission } from '../../../ui/form-submission';
import { AccountApi } from '../../../core/auth/account-api';

/** Ask for a link to choose a new password. The answer never says whether the address exists. */
@Component({
  selector: 'll-forgot-password',
  imports: [ReactiveFormsModule, RouterLink, MatButtonModule, AccountPage, TextField],
  templateUrl: './forgot-password.html',
  styleUrl: '../account-form.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ForgotPassword {
  private readonly api = inject(AccountApi);

  protected readonly form = inject(FormBuilder).nonNullable.group({
    email: ['', [Validators.required, Validators.email]],
  });
  protected readonly sent = signal('');
  protected readonly submission = new FormSubmission();

  protected async requestLink(): Promise<void> {
    await this.submission.submit(this.form, async () => {
      const answer = await this.api.requestPasswordReset(this.form.getRawValue());
      this.sent.set(answer.message);
    });
  }
}
