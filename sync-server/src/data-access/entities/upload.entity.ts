import { Column, CreateDateColumn, Entity, PrimaryColumn } from 'typeorm';

import type { UploadMediaType } from '../../../../shared/api/upload';

/**
 * An uploaded image, stored once whoever uploads it: the id is the hex SHA-256 of `bytes`.
 * Who may read it is in `upload_owners`.
 */
@Entity({ name: 'uploads' })
export class Upload {
  @PrimaryColumn({ type: 'text' })
  id: string;

  @Column({ name: 'media_type', type: 'text' })
  mediaType: UploadMediaType;

  @Column({ name: 'byte_size', type: 'integer' })
  byteSize: number;

  @Column({ type: 'bytea' })
  bytes: Buffer;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;
}
