import { Column, Entity } from 'typeorm';

import { SyncedRow } from './synced-row';

/** One status change of a book (`bookStatusChanges` in the shared schema). */
@Entity({ name: 'book_status_changes' })
export class BookStatusChangeRow extends SyncedRow {
  @Column({ name: 'book_id', type: 'uuid', nullable: true })
  bookId: string | null;

  @Column({ type: 'text', nullable: true })
  status: string | null;

  @Column({ name: 'changed_at', type: 'text', nullable: true })
  changedAt: string | null;
}
