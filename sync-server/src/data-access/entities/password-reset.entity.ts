import { Column, Entity, JoinColumn, ManyToOne } from 'typeorm';

import { SingleUseSecret } from './single-use-secret';
import { User } from './user.entity';

/** A password-reset link: single use, short-lived. */
@Entity({ name: 'password_resets' })
export class PasswordReset extends SingleUseSecret {
  @Column({ name: 'user_id', type: 'uuid' })
  userId: string;

  @ManyToOne(() => User, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'user_id' })
  user?: User;
}
