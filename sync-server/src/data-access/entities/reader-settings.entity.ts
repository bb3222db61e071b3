import { Column, Entity } from 'typeorm';

import { SyncedRow } from './synced-row';

/** The reader's synced settings (`readerSettings` in the shared schema). */
@Entity({ name: 'reader_settings' })
export class ReaderSettingsRow extends SyncedRow {
  @Column({ name: 'date_locale', type: 'text', nullable: true })
  dateLocale: string | null;

  @Column({ type: 'text', nullable: true })
  theme: string | null;
}
