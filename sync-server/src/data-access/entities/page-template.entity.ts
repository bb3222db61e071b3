import { Column, Entity } from 'typeorm';

import { SyncedRow } from './synced-row';

/** A page layout the reader saved (`pageTemplates` in the shared schema). */
@Entity({ name: 'page_templates' })
export class PageTemplateRow extends SyncedRow {
  @Column({ type: 'text', nullable: true })
  name: string | null;

  @Column({ type: 'text', nullable: true })
  title: string | null;

  @Column({ type: 'text', nullable: true })
  body: string | null;
}
