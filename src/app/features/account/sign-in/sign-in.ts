import { ChangeDetectionStrategy, Component, inject, input } from '@angular/core';
import { FormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { Router, RouterLink } from '@angular/router';

import { Auth } from '../../../core/auth/auth';
import { AccountPage } from '../account-page/account-page';
import { BusyBar } from '../../../ui/busy-bar/busy-bar';
import { TextField } from '../../../ui/text-field/text-field';
import { FormSubmission } from '../../../ui/form-submission';

/** Sign in with e-mail and password; needed once per device, then the journal opens offline. */
@Component({
  selector: 'll-sign-in',
  imports: [ReactiveFormsModule, RouterLink, MatButtonModule, AccountPage, BusyBar, TextField],
  templateUrl: './sign-in.html',
  styleUrl: '../account-form.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SignIn {
  private readonly auth = inject(Auth);
  private readonly router = inject(Router);

  /** Where to go after signing in (from the `next` query parameter). */
  readonly next = input<string>();

  protected readonly form = inject(FormBuilder).nonNullable.group({
    email: [this.auth.user()?.email ?? '', [Validators.required, Validators.email]],
    password: ['', Validators.required],
  });
  protected readonly submission = new FormSubmission();
  protected readonly reason = this.auth.needsSignIn;

  protected async signIn(): Promise<void> {
    const { email, password } = this.form.getRawValue();
    if (await this.submission.submit(this.form, () => this.auth.signIn(email, password))) {
      await this.router.navigateByUrl(this.safeNext());
    }
  }

  /** Only paths inside the app, never another site. */
  private safeNext(): string {
    const next = this.next();
    return next && next.startsWith('/') && !next.startsWith('//') ? next : '/today';
  }
}
