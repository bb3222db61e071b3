import { Column, Entity } from 'typeorm';

import { SyncedRow } from './synced-row';

/** A favourite book, author or quote (`favourites` in the shared schema). */
@Entity({ name: 'favourites' })
export class FavouriteRow extends SyncedRow {
  @Column({ type: 'text', nullable: true })
  kind: string | null;

  @Column({ name: 'book_id', type: 'uuid', nullable: true })
  bookId: string | null;

  @Column({ name: 'quote_id', type: 'uuid', nullable: true })
  quoteId: string | null;

  @Column({ name: 'author_name', type: 'text', nullable: true })
  authorName: string | null;

  @Column({ type: 'text', nullable: true })
  why: string | null;
}
