import { Column, Entity } from 'typeorm';

import { SyncedRow } from './synced-row';

/** A label for books and quotes (`labels` in the shared schema). */
@Entity({ name: 'labels' })
export class LabelRow extends SyncedRow {
  @Column({ type: 'text', nullable: true })
  name: string | null;

  @Column({ type: 'text', nullable: true })
  colour: string | null;

  @Column({ type: 'text', nullable: true })
  icon: string | null;
}
