import { Column, Entity } from 'typeorm';

import { SyncedRow } from './synced-row';

/** One stretch of reading or listening (`sessions` in the shared schema). */
@Entity({ name: 'sessions' })
export class SessionRow extends SyncedRow {
  @Column({ name: 'book_id', type: 'uuid', nullable: true })
  bookId: string | null;

  @Column({ type: 'text', nullable: true })
  format: string | null;

  @Column({ name: 'started_at', type: 'text', nullable: true })
  startedAt: string | null;

  @Column({ name: 'ended_at', type: 'text', nullable: true })
  endedAt: string | null;

  @Column({ name: 'active_minutes', type: 'double precision', nullable: true })
  activeMinutes: number | null;

  @Column({ name: 'from_position', type: 'double precision', nullable: true })
  fromPosition: number | null;

  @Column({ name: 'to_position', type: 'double precision', nullable: true })
  toPosition: number | null;

  @Column({ name: 'ebook_location', type: 'text', nullable: true })
  ebookLocation: string | null;

  @Column({ name: 'playback_speed', type: 'double precision', nullable: true })
  playbackSpeed: number | null;

  @Column({ type: 'text', nullable: true })
  mood: string | null;

  @Column({ type: 'text', nullable: true })
  note: string | null;

  @Column({ type: 'text', nullable: true })
  source: string | null;
}
