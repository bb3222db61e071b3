import type { Loan, LoanReminders } from '../sync/schema/collections';
import { daysFrom, loanState } from './loan-state';

/** One thing to remind the reader of, and the key that makes sure it is sent once. */
export interface ReminderItem {
  /** Unique per loan and date: a renewed loan (a new due date) is reminded of again. */
  readonly key: string;
  readonly kind: 'due' | 'holdReady' | 'lentOverdue';
  readonly bookId: string | null;
  /** The date the mail names (due on, pick up by, expected back), 'YYYY-MM-DD'. */
  readonly date: string | null;
}

/** The reader's choices with their defaults: N = 2 days, holds and lent books on. */
export function reminderChoices(settings: Partial<LoanReminders>) {
  return {
    daysBefore: settings.daysBefore ?? 2,
    holdReady: settings.holdReady ?? true,
    lentOverdue: settings.lentOverdue ?? true,
    digest: settings.digest ?? false,
  };
}

/**
 * What is due for a reminder on the reader's local day `today`: a loan (library or a friend's
 * book) due within `daysBefore` days or overdue, a hold ready, a lent book past its expected
 * date. Catching up on "within", not "exactly N days before", means a day the server missed is
 * not a reminder lost; the key keeps it to one mail.
 */
export function remindersDue(loans: readonly Loan[], settings: Partial<LoanReminders>, today: string): ReminderItem[] {
  const choices = reminderChoices(settings);
  const items: ReminderItem[] = [];
  for (const loan of loans) {
    const state = loanState(loan, today);
    const bookId = loan.bookId ?? null;
    if ((loan.kind === 'library' || loan.kind === 'borrowed') && loan.dueOn && state !== 'closed' && daysFrom(today, loan.dueOn) <= choices.daysBefore) {
      items.push({ key: `due:${loan.id}:${loan.dueOn}`, kind: 'due', bookId, date: loan.dueOn });
    } else if (state === 'holdReady' && choices.holdReady) {
      items.push({ key: `ready:${loan.id}:${loan.readyOn ?? ''}`, kind: 'holdReady', bookId, date: loan.pickUpBy ?? null });
    } else if (state === 'lentOverdue' && choices.lentOverdue) {
      items.push({ key: `lent:${loan.id}:${loan.dueOn ?? ''}`, kind: 'lentOverdue', bookId, date: loan.dueOn ?? null });
    }
  }
  return items.sort((a, b) => (a.date ?? '9999').localeCompare(b.date ?? '9999') || a.key.localeCompare(b.key));
}
