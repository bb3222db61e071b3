import { CreateDateColumn, Entity, JoinColumn, ManyToOne, PrimaryColumn } from 'typeorm';

import { Upload } from './upload.entity';
import { User } from './user.entity';

/** A reader who uploaded an image and so may read it. Both sides cascade on delete. */
@Entity({ name: 'upload_owners' })
export class UploadOwner {
  @PrimaryColumn({ name: 'upload_id', type: 'text' })
  uploadId: string;

  @PrimaryColumn({ name: 'user_id', type: 'uuid' })
  userId: string;

  @ManyToOne(() => Upload, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'upload_id' })
  upload?: Upload;

  @ManyToOne(() => User, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'user_id' })
  user?: User;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;
}
