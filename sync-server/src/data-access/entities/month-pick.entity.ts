import { Column, Entity } from 'typeorm';

import { SyncedRow } from './synced-row';

/** The pick of a month (`monthPicks` in the shared schema). */
@Entity({ name: 'month_picks' })
export class MonthPickRow extends SyncedRow {
  @Column({ type: 'text', nullable: true })
  month: string | null;

  @Column({ name: 'book_id', type: 'uuid', nullable: true })
  bookId: string | null;

  @Column({ type: 'text', nullable: true })
  why: string | null;
}
