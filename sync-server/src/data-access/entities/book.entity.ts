import { Column, Entity } from 'typeorm';

import { SyncedRow } from './synced-row';

/**
 * A reader's book, as the server stores it. Columns follow `books` in
 * shared/sync/schema/collections.ts (a spec checks they agree); all are nullable because a
 * row may arrive one field at a time.
 */
@Entity({ name: 'books' })
export class BookRow extends SyncedRow {
  @Column({ type: 'text', nullable: true })
  title: string | null;

  @Column({ type: 'text', nullable: true })
  subtitle: string | null;

  @Column({ type: 'text', array: true, nullable: true })
  authors: string[] | null;

  @Column({ type: 'text', nullable: true })
  format: string | null;

  @Column({ name: 'page_count', type: 'integer', nullable: true })
  pageCount: number | null;

  @Column({ name: 'audio_minutes', type: 'integer', nullable: true })
  audioMinutes: number | null;

  @Column({ type: 'text', nullable: true })
  isbn: string | null;

  @Column({ type: 'text', nullable: true })
  publisher: string | null;

  @Column({ type: 'integer', nullable: true })
  year: number | null;

  @Column({ type: 'text', nullable: true })
  language: string | null;

  @Column({ type: 'text', array: true, nullable: true })
  genres: string[] | null;

  @Column({ type: 'text', array: true, nullable: true })
  tags: string[] | null;

  @Column({ type: 'text', nullable: true })
  status: string | null;

  @Column({ name: 'status_changed_at', type: 'text', nullable: true })
  statusChangedAt: string | null;

  @Column({ type: 'text', nullable: true })
  copy: string | null;

  @Column({ name: 'cover_id', type: 'text', nullable: true })
  coverId: string | null;

  @Column({ type: 'double precision', nullable: true })
  rating: number | null;

  @Column({ name: 'label_ids', type: 'text', array: true, nullable: true })
  labelIds: string[] | null;

  @Column({ name: 'series_id', type: 'uuid', nullable: true })
  seriesId: string | null;

  @Column({ name: 'series_position', type: 'double precision', nullable: true })
  seriesPosition: number | null;

  @Column({ name: 'dnf_progress', type: 'double precision', nullable: true })
  dnfProgress: number | null;

  @Column({ name: 'dnf_unit', type: 'text', nullable: true })
  dnfUnit: string | null;

  @Column({ name: 'dnf_on', type: 'text', nullable: true })
  dnfOn: string | null;

  @Column({ name: 'dnf_reason', type: 'text', nullable: true })
  dnfReason: string | null;

  @Column({ name: 'wish_priority', type: 'text', nullable: true })
  wishPriority: string | null;

  @Column({ name: 'wish_where', type: 'text', nullable: true })
  wishWhere: string | null;

  @Column({ name: 'wish_price_note', type: 'text', nullable: true })
  wishPriceNote: string | null;

  @Column({ name: 'release_date', type: 'text', nullable: true })
  releaseDate: string | null;

  @Column({ type: 'boolean', nullable: true })
  preordered: boolean | null;
}
