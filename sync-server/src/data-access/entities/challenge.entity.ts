import { Column, Entity } from 'typeorm';

import { SyncedRow } from './synced-row';

/** A reading challenge (`challenges` in the shared schema). */
@Entity({ name: 'challenges' })
export class ChallengeRow extends SyncedRow {
  @Column({ type: 'text', nullable: true })
  name: string | null;

  @Column({ type: 'text', nullable: true })
  kind: string | null;

  @Column({ name: 'period_start', type: 'text', nullable: true })
  periodStart: string | null;

  @Column({ name: 'period_end', type: 'text', nullable: true })
  periodEnd: string | null;

  @Column({ type: 'integer', nullable: true })
  target: number | null;

  @Column({ name: 'alphabet_by', type: 'text', nullable: true })
  alphabetBy: string | null;

  @Column({ type: 'jsonb', nullable: true })
  prompts: unknown | null;

  @Column({ name: 'celebrated_at', type: 'text', nullable: true })
  celebratedAt: string | null;
}
