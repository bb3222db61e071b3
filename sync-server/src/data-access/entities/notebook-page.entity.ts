import { Column, Entity } from 'typeorm';

import { SyncedRow } from './synced-row';

/** One page of a notebook (`notebookPages` in the shared schema). */
@Entity({ name: 'notebook_pages' })
export class NotebookPageRow extends SyncedRow {
  @Column({ name: 'notebook_id', type: 'uuid', nullable: true })
  notebookId: string | null;

  @Column({ type: 'text', nullable: true })
  title: string | null;

  @Column({ type: 'text', nullable: true })
  body: string | null;

  @Column({ type: 'double precision', nullable: true })
  position: number | null;
}
