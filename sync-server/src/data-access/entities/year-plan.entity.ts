import { Column, Entity } from 'typeorm';

import { SyncedRow } from './synced-row';

/** The reader's plan for a year (`yearPlans` in the shared schema). */
@Entity({ name: 'year_plans' })
export class YearPlanRow extends SyncedRow {
  @Column({ type: 'integer', nullable: true })
  year: number | null;

  @Column({ name: 'books_target', type: 'integer', nullable: true })
  booksTarget: number | null;

  @Column({ name: 'pages_target', type: 'integer', nullable: true })
  pagesTarget: number | null;

  @Column({ name: 'minutes_target', type: 'integer', nullable: true })
  minutesTarget: number | null;

  @Column({ name: 'best_book_id', type: 'uuid', nullable: true })
  bestBookId: string | null;

  @Column({ name: 'other_goals', type: 'jsonb', nullable: true })
  otherGoals: unknown | null;

  @Column({ type: 'text', nullable: true })
  notes: string | null;
}
