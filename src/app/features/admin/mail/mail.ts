import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { RouterLink } from '@angular/router';

import type { CaughtMail } from '@shared/account/account-input';

import { readableError } from '../../../core/http/api-error-message';
import { AdminApi } from '../admin-api';
import { ReaderDatePipe } from '../../../ui/reader-date';

/** Development only: the mail the local inbox caught, so a reset link can be followed locally. */
@Component({
  selector: 'll-mail',
  imports: [ReaderDatePipe, RouterLink],
  templateUrl: './mail.html',
  styleUrl: './mail.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Mail {
  private readonly api = inject(AdminApi);
  protected readonly messages = signal<readonly CaughtMail[]>([]);
  protected readonly problem = signal('');

  /** Links in a message that lead back into this app (reset links), to click them here. */
  protected linksIn(text: string): string[] {
    return (text.match(/https?:\/\/\S+/g) ?? []).filter((url) => url.startsWith(globalThis.location.origin));
  }

  constructor() {
    this.api.caughtMail().then(
      (messages) => this.messages.set(messages),
      (error: unknown) => this.problem.set(readableError(error).message),
    );
  }
}
