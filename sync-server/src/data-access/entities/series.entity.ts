import { Column, Entity } from 'typeorm';

import { SyncedRow } from './synced-row';

/** A series the reader follows (`series` in the shared schema). */
@Entity({ name: 'series' })
export class SeriesRow extends SyncedRow {
  @Column({ type: 'text', nullable: true })
  name: string | null;

  @Column({ name: 'planned_count', type: 'integer', nullable: true })
  plannedCount: number | null;

  @Column({ type: 'text', nullable: true })
  review: string | null;

  @Column({ type: 'double precision', nullable: true })
  rating: number | null;
}
