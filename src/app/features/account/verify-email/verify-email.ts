import { ChangeDetectionStrategy, Component, inject, signal, type OnInit } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { RouterLink } from '@angular/router';

import { Auth } from '../../../core/auth/auth';
import { readableError } from '../../../core/http/api-error-message';
import { AccountPage } from '../account-page/account-page';
import { AccountApi } from '../../../core/auth/account-api';

type Step = 'checking' | 'verified' | 'refused' | 'link-sent';

/**
 * The page a confirmation link opens. The signed token travels in the URL fragment
 * (`#token=…`), which browsers never send to a server; it is posted once, from here.
 */
@Component({
  selector: 'll-verify-email',
  imports: [RouterLink, MatButtonModule, AccountPage],
  templateUrl: './verify-email.html',
  styleUrl: '../account-form.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class VerifyEmail implements OnInit {
  private readonly api = inject(AccountApi);
  protected readonly auth = inject(Auth);

  protected readonly token = new URLSearchParams(globalThis.location?.hash.slice(1) ?? '').get('token') ?? '';
  protected readonly step = signal<Step>('checking');
  protected readonly problem = signal('');

  ngOnInit(): void {
    if (!this.token) {
      this.refuse('This link is incomplete. Open the link from the e-mail again.');
      return;
    }
    void this.confirm();
  }

  protected async sendNewLink(): Promise<void> {
    try {
      await this.api.sendVerificationLink();
      this.step.set('link-sent');
    } catch (error) {
      this.refuse(readableError(error).message);
    }
  }

  private async confirm(): Promise<void> {
    try {
      await this.api.verifyEmail(this.token);
      this.step.set('verified');
    } catch (error) {
      this.refuse(readableError(error).message);
    }
  }

  private refuse(message: string): void {
    this.problem.set(message);
    this.step.set('refused');
  }
}
