import { Column, Entity } from 'typeorm';

import { SyncedRow } from './synced-row';

/** The reader's choice of loan reminders by e-mail (`loanReminders` in the shared schema). */
@Entity({ name: 'loan_reminders' })
export class LoanRemindersRow extends SyncedRow {
  @Column({ type: 'boolean', nullable: true })
  email: boolean | null;

  @Column({ name: 'days_before', type: 'integer', nullable: true })
  daysBefore: number | null;

  @Column({ name: 'hold_ready', type: 'boolean', nullable: true })
  holdReady: boolean | null;

  @Column({ name: 'lent_overdue', type: 'boolean', nullable: true })
  lentOverdue: boolean | null;

  @Column({ type: 'boolean', nullable: true })
  digest: boolean | null;

  @Column({ name: 'time_zone', type: 'text', nullable: true })
  timeZone: string | null;

  @Column({ name: 'email_since', type: 'text', nullable: true })
  emailSince: string | null;
}
