import { Column, Entity } from 'typeorm';

import { SyncedRow } from './synced-row';

/** One reading of a book with its review (`readings` in the shared schema). */
@Entity({ name: 'readings' })
export class ReadingRow extends SyncedRow {
  @Column({ name: 'book_id', type: 'uuid', nullable: true })
  bookId: string | null;

  @Column({ name: 'started_on', type: 'text', nullable: true })
  startedOn: string | null;

  @Column({ name: 'finished_on', type: 'text', nullable: true })
  finishedOn: string | null;

  @Column({ type: 'double precision', nullable: true })
  rating: number | null;

  @Column({ type: 'text', nullable: true })
  summary: string | null;

  @Column({ type: 'text', nullable: true })
  review: string | null;

  @Column({ type: 'text', nullable: true })
  takeaways: string | null;

  @Column({ type: 'text', nullable: true })
  recommend: string | null;

  @Column({ name: 'recommend_to', type: 'text', nullable: true })
  recommendTo: string | null;
}
