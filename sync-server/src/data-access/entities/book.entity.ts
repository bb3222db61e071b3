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
}
