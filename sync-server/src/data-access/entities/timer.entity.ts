import { Column, Entity } from 'typeorm';

import { SyncedRow } from './synced-row';

/** The reader's reading timer (`timers` in the shared schema). */
@Entity({ name: 'timers' })
export class TimerRow extends SyncedRow {
  @Column({ type: 'text', nullable: true })
  state: string | null;

  @Column({ name: 'book_id', type: 'uuid', nullable: true })
  bookId: string | null;

  @Column({ name: 'started_at', type: 'text', nullable: true })
  startedAt: string | null;

  @Column({ name: 'paused_at', type: 'text', nullable: true })
  pausedAt: string | null;

  @Column({ name: 'paused_ms', type: 'double precision', nullable: true })
  pausedMs: number | null;

  @Column({ name: 'device_id', type: 'text', nullable: true })
  deviceId: string | null;

  @Column({ name: 'device_name', type: 'text', nullable: true })
  deviceName: string | null;

  @Column({ name: 'target_minutes', type: 'integer', nullable: true })
  targetMinutes: number | null;

  @Column({ name: 'start_position', type: 'double precision', nullable: true })
  startPosition: number | null;
}
