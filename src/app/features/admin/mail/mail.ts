import { DatePipe } from '@angular/common';
import { HttpClient } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { RouterLink } from '@angular/router';
import { firstValueFrom } from 'rxjs';

import type { CaughtMail } from '@shared/account/account-input';

import { readableError } from '../../../core/http/api-error-message';

/** Development only: the mail the local inbox caught, so a reset link can be followed locally. */
@Component({
  selector: 'll-mail',
  imports: [DatePipe, RouterLink],
  templateUrl: './mail.html',
  styleUrl: './mail.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Mail {
  private readonly http = inject(HttpClient);
  protected readonly messages = signal<readonly CaughtMail[]>([]);
  protected readonly problem = signal('');

  /** Links in a message that lead back into this app (reset links), to click them here. */
  protected linksIn(text: string): string[] {
    return (text.match(/https?:\/\/\S+/g) ?? []).filter((url) => url.startsWith(globalThis.location.origin));
  }

  constructor() {
    firstValueFrom(this.http.get<CaughtMail[]>('/api/admin/mail')).then(
      (messages) => this.messages.set(messages),
      (error: unknown) => this.problem.set(readableError(error).message),
    );
  }
}
