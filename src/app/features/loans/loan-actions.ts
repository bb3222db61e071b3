import { inject, Injectable } from '@angular/core';

import { localDay } from '@shared/calendar/local-day';
import { renewLoan } from '@shared/loans/renew-loan';
import type { Library, Loan } from '@shared/sync/schema/collections';

import { JournalStore } from '../../core/data/journal-store';
import { CLOCK } from '../../core/time/clock';
import { TIME_ZONE } from '../../core/time/time-zone';

/** The one-click changes a loan offers, written to this device first (they sync later). */
@Injectable({ providedIn: 'root' })
export class LoanActions {
  private readonly store = inject(JournalStore);
  private readonly clock = inject(CLOCK);
  private readonly timeZone = inject(TIME_ZONE);

  private today(): string {
    return localDay(new Date(this.clock.now()).toISOString(), this.timeZone);
  }

  /** Renews by the library's usual period (21 days when not known); a refusal comes back as words. */
  async renew(loan: Loan, library: Library | undefined): Promise<string | null> {
    const renewal = renewLoan(loan, { loanDays: library?.loanDays ?? 21 });
    if ('refused' in renewal) return renewal.refused;
    await this.store.write('loans', loan.id, { dueOn: renewal.dueOn, renewalsUsed: renewal.renewalsUsed });
    return null;
  }

  returned(loan: Loan): Promise<void> {
    return this.store.write('loans', loan.id, { returnedOn: this.today() });
  }

  holdReady(loan: Loan, pickUpBy: string | null): Promise<void> {
    return this.store.write('loans', loan.id, { readyOn: this.today(), pickUpBy });
  }

  /** A collected hold becomes a library loan in one step: the hold closes, a loan starts today. */
  async collect(loan: Loan, library: Library | undefined): Promise<string> {
    const today = this.today();
    const days = library?.loanDays ?? 21;
    const due = new Date(`${today}T00:00:00Z`);
    due.setUTCDate(due.getUTCDate() + days);
    await this.store.write('loans', loan.id, { holdOutcome: 'collected', closedOn: today });
    return this.store.create('loans', {
      kind: 'library',
      bookId: loan.bookId ?? null,
      libraryId: loan.libraryId ?? null,
      startedOn: today,
      dueOn: due.toISOString().slice(0, 10),
      renewalsUsed: 0,
      renewalsAllowed: library?.renewalsAllowed ?? null,
    });
  }

  endHold(loan: Loan, outcome: 'cancelled' | 'expired'): Promise<void> {
    return this.store.write('loans', loan.id, { holdOutcome: outcome, closedOn: this.today() });
  }
}
