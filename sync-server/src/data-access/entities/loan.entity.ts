import { Column, Entity } from 'typeorm';

import { SyncedRow } from './synced-row';

/** A loan, hold or lending (`loans` in the shared schema). */
@Entity({ name: 'loans' })
export class LoanRow extends SyncedRow {
  @Column({ type: 'text', nullable: true })
  kind: string | null;

  @Column({ name: 'book_id', type: 'uuid', nullable: true })
  bookId: string | null;

  @Column({ name: 'library_id', type: 'uuid', nullable: true })
  libraryId: string | null;

  @Column({ name: 'friend_name', type: 'text', nullable: true })
  friendName: string | null;

  @Column({ name: 'started_on', type: 'text', nullable: true })
  startedOn: string | null;

  @Column({ name: 'due_on', type: 'text', nullable: true })
  dueOn: string | null;

  @Column({ name: 'renewals_used', type: 'integer', nullable: true })
  renewalsUsed: number | null;

  @Column({ name: 'renewals_allowed', type: 'integer', nullable: true })
  renewalsAllowed: number | null;

  @Column({ name: 'returned_on', type: 'text', nullable: true })
  returnedOn: string | null;

  @Column({ name: 'queue_position', type: 'integer', nullable: true })
  queuePosition: number | null;

  @Column({ name: 'ready_on', type: 'text', nullable: true })
  readyOn: string | null;

  @Column({ name: 'pick_up_by', type: 'text', nullable: true })
  pickUpBy: string | null;

  @Column({ name: 'hold_outcome', type: 'text', nullable: true })
  holdOutcome: string | null;

  @Column({ name: 'closed_on', type: 'text', nullable: true })
  closedOn: string | null;
}
