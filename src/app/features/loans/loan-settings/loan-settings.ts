import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatCheckboxModule } from '@angular/material/checkbox';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';

import { deterministicId } from '@shared/sync/deterministic-id';
import type { LoanReminders } from '@shared/sync/schema/collections';

import { JournalStore } from '../../../core/data/journal-store';
import { liveQuerySignal } from '../../../core/data/live-query';
import { CLOCK } from '../../../core/time/clock';
import { TIME_ZONE } from '../../../core/time/time-zone';
import { CalendarFeedApi } from './calendar-feed-api';

/** The one reminders row of a reader, the same id on every device. */
export const LOAN_REMINDERS_ID = deterministicId('loan-reminders', 'settings');

type Choice = 'holdReady' | 'lentOverdue' | 'digest';

/** Settings › Loan reminders (by e-mail, off until chosen) and Calendar (a private feed URL). */
@Component({
  selector: 'll-loan-settings',
  imports: [MatButtonModule, MatCheckboxModule, MatFormFieldModule, MatInputModule],
  templateUrl: './loan-settings.html',
  styleUrl: './loan-settings.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LoanSettings {
  private readonly store = inject(JournalStore);
  private readonly clock = inject(CLOCK);
  private readonly timeZone = inject(TIME_ZONE);
  private readonly api = inject(CalendarFeedApi);

  private readonly row = liveQuerySignal(async (db) => (await db.rows('loanReminders').get(LOAN_REMINDERS_ID)) as LoanReminders | undefined, undefined);
  protected readonly on = computed(() => this.row()?.email === true);
  protected readonly daysBefore = computed(() => this.row()?.daysBefore ?? 2);
  protected readonly choice = (name: Choice) => this.row()?.[name] ?? name !== 'digest';
  protected readonly daysProblem = signal('');

  protected readonly feedUrl = signal<string | null>(null);
  protected readonly feedActive = signal<boolean | null>(null);
  protected readonly feedProblem = signal('');

  constructor() {
    this.api.status().then(
      (status) => this.feedActive.set(status.active),
      () => this.feedProblem.set('The calendar settings need a connection.'),
    );
  }

  protected turn(on: boolean): Promise<void> {
    return this.store.write('loanReminders', LOAN_REMINDERS_ID, {
      email: on,
      timeZone: this.timeZone,
      // Mails start again only after this moment, even if an unsubscribe link was used before.
      ...(on ? { emailSince: new Date(this.clock.now()).toISOString(), daysBefore: this.daysBefore() } : {}),
    });
  }

  protected setChoice(name: Choice, value: boolean): Promise<void> {
    return this.store.write('loanReminders', LOAN_REMINDERS_ID, { [name]: value, timeZone: this.timeZone });
  }

  protected async setDays(text: string): Promise<void> {
    const days = Number(text);
    if (!Number.isInteger(days) || days < 0 || days > 30) {
      this.daysProblem.set('Days before must be a whole number from 0 to 30.');
      return;
    }
    this.daysProblem.set('');
    await this.store.write('loanReminders', LOAN_REMINDERS_ID, { daysBefore: days, timeZone: this.timeZone });
  }

  protected async makeFeed(): Promise<void> {
    try {
      const path = await this.api.regenerate();
      this.feedUrl.set(`${location.origin}${path}`);
      this.feedActive.set(true);
      this.feedProblem.set('');
    } catch {
      this.feedProblem.set('Could not reach the server. Try again when you are online.');
    }
  }

  protected async revokeFeed(): Promise<void> {
    try {
      await this.api.revoke();
      this.feedUrl.set(null);
      this.feedActive.set(false);
      this.feedProblem.set('');
    } catch {
      this.feedProblem.set('Could not reach the server. Try again when you are online.');
    }
  }
}
