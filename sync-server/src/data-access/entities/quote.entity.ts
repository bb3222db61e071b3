import { Column, Entity } from 'typeorm';

import { SyncedRow } from './synced-row';

/** A passage the reader kept (`quotes` in the shared schema). */
@Entity({ name: 'quotes' })
export class QuoteRow extends SyncedRow {
  @Column({ name: 'book_id', type: 'uuid', nullable: true })
  bookId: string | null;

  @Column({ type: 'text', nullable: true })
  text: string | null;

  @Column({ type: 'integer', nullable: true })
  page: number | null;

  @Column({ name: 'ebook_location', type: 'text', nullable: true })
  ebookLocation: string | null;

  @Column({ name: 'audio_seconds', type: 'integer', nullable: true })
  audioSeconds: number | null;

  @Column({ type: 'text', nullable: true })
  chapter: string | null;

  @Column({ type: 'text', nullable: true })
  note: string | null;

  @Column({ type: 'text', array: true, nullable: true })
  tags: string[] | null;

  @Column({ name: 'label_ids', type: 'text', array: true, nullable: true })
  labelIds: string[] | null;

  @Column({ type: 'boolean', nullable: true })
  favourite: boolean | null;

  @Column({ name: 'captured_at', type: 'text', nullable: true })
  capturedAt: string | null;
}
