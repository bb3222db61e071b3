import { Column, Entity } from 'typeorm';

import { SyncedRow } from './synced-row';

/** The reader's plan for a month (`monthPlans` in the shared schema). */
@Entity({ name: 'month_plans' })
export class MonthPlanRow extends SyncedRow {
  @Column({ type: 'text', nullable: true })
  month: string | null;

  @Column({ name: 'books_target', type: 'integer', nullable: true })
  booksTarget: number | null;

  @Column({ name: 'pages_target', type: 'integer', nullable: true })
  pagesTarget: number | null;

  @Column({ name: 'minutes_target', type: 'integer', nullable: true })
  minutesTarget: number | null;

  @Column({ name: 'favourite_book_id', type: 'uuid', nullable: true })
  favouriteBookId: string | null;

  @Column({ name: 'least_favourite_book_id', type: 'uuid', nullable: true })
  leastFavouriteBookId: string | null;

  @Column({ type: 'text', nullable: true })
  reflection: string | null;
}
