import { Column, PrimaryColumn } from 'typeorm';

/**
 * What every synced row keeps besides its fields: whose it is, the clock of each field, and the
 * server sequence of its last winning change (what pulls page by). Row ids are made by clients
 * and are only unique per user.
 */
export abstract class SyncedRow {
  @PrimaryColumn({ name: 'user_id', type: 'uuid' })
  userId: string;

  @PrimaryColumn({ type: 'uuid' })
  id: string;

  /** field → HLC text of its current value. */
  @Column({ type: 'jsonb', default: {} })
  clocks: Record<string, string>;

  /** Set fields' per-element states (field → observed-remove state, shared/sync/or-set.ts). */
  @Column({ type: 'jsonb', default: {} })
  sets: Record<string, unknown>;

  /** bigint arrives as a string from pg. */
  @Column({ type: 'bigint' })
  seq: string;

  /** The tombstone: rows are never removed, so a deletion syncs like any edit. */
  @Column({ type: 'boolean', nullable: true })
  deleted: boolean | null;
}
