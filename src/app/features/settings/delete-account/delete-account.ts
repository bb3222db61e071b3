import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { FormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { Router } from '@angular/router';

import { Auth } from '../../../core/auth/auth';
import { LocalJournal } from '../../../core/data/local-journal';
import { TextField } from '../../../ui/text-field/text-field';
import { FormSubmission } from '../../../ui/form-submission';
import { ExportPanel } from '../../your-data';
import { AccountApi } from '../../../core/auth/account-api';

/** Delete the account and all its data, on the server and on this device, after the password. */
@Component({
  selector: 'll-delete-account',
  imports: [ReactiveFormsModule, MatButtonModule, ExportPanel, TextField],
  templateUrl: './delete-account.html',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class DeleteAccount {
  private readonly api = inject(AccountApi);
  private readonly auth = inject(Auth);
  private readonly journal = inject(LocalJournal);
  private readonly router = inject(Router);

  protected readonly form = inject(FormBuilder).nonNullable.group({ password: ['', Validators.required] });
  protected readonly confirming = signal(false);
  protected readonly submission = new FormSubmission();

  protected async deleteAccount(): Promise<void> {
    const user = this.auth.user();
    if (!user) return;
    const deleted = await this.submission.submit(this.form, () => this.api.deleteAccount(this.form.getRawValue()));
    if (!deleted) return;
    await this.auth.signOut();
    await this.journal.erase(user.id);
    await this.router.navigateByUrl('/register');
  }
}
