import { Column, Entity } from 'typeorm';

import { SyncedRow } from './synced-row';

/** A notebook of free-form pages (`notebooks` in the shared schema). */
@Entity({ name: 'notebooks' })
export class NotebookRow extends SyncedRow {
  @Column({ type: 'text', nullable: true })
  title: string | null;

  @Column({ name: 'book_id', type: 'uuid', nullable: true })
  bookId: string | null;
}
