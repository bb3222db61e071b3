import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { RouterLink } from '@angular/router';

import type { CaughtMail } from '@shared/api/admin';

import { readableError } from '../../../core/http/api-error-message';
import { AdminApi } from '../admin-api';
import { ReaderDatePipe } from '../../../ui/reader-date';

/** Development only: the mail the local inbox caught, so a reset link can be followed locally. */
@Component({
  selector: 'll-mail',
  imports: [ReaderDatePipe, RouterLink, MatButtonModule],
  templateUrl: './mail.html',
  styleUrl: './mail.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Mail {
  private readonly api = inject(AdminApi);
  protected readonly messages = signal<readonly CaughtMail[]>([]);
  protected readonly problem = signal('');
  /** Messages to the same recipients with the same subject, together, newest group first. */
  protected readonly groups = computed(() => groupCaughtMail(this.messages()));

  protected async empty(): Promise<void> {
    try {
      await this.api.emptyCaughtMail();
      this.messages.set([]);
      this.problem.set('');
    } catch (error) {
      this.problem.set(readableError(error).message);
    }
  }

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

/** Caught mail grouped by recipients and subject, in the order of each group's newest message (the list comes newest first). */
export function groupCaughtMail(messages: readonly CaughtMail[]): { key: string; to: string; subject: string; messages: CaughtMail[] }[] {
  const groups = new Map<string, { key: string; to: string; subject: string; messages: CaughtMail[] }>();
  for (const mail of messages) {
    const to = mail.to.join(', ');
    const key = `${to}\u0000${mail.subject}`;
    const group = groups.get(key) ?? { key, to, subject: mail.subject, messages: [] };
    group.messages.push(mail);
    groups.set(key, group);
  }
  return [...groups.values()];
}
