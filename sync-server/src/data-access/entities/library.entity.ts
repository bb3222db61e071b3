import { Column, Entity } from 'typeorm';

import { SyncedRow } from './synced-row';

/** A library the reader borrows from (`libraries` in the shared schema). */
@Entity({ name: 'libraries' })
export class LibraryRow extends SyncedRow {
  @Column({ type: 'text', nullable: true })
  name: string | null;

  @Column({ name: 'card_label', type: 'text', nullable: true })
  cardLabel: string | null;

  @Column({ name: 'card_number', type: 'text', nullable: true })
  cardNumber: string | null;

  @Column({ name: 'loan_days', type: 'integer', nullable: true })
  loanDays: number | null;

  @Column({ name: 'renewals_allowed', type: 'integer', nullable: true })
  renewalsAllowed: number | null;
}
