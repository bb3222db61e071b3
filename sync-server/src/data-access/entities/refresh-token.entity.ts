import { Column, Entity, JoinColumn, ManyToOne } from 'typeorm';

import { DeviceSession } from './device-session.entity';
import { SingleUseSecret } from './single-use-secret';

/** A refresh token of one device session; `usedAt` is set when it is rotated. */
@Entity({ name: 'refresh_tokens' })
export class RefreshToken extends SingleUseSecret {
  @Column({ name: 'session_id', type: 'uuid' })
  sessionId: string;

  /** When this token, already rotated, was answered once more within the grace window. */
  @Column({ name: 'grace_used_at', type: 'timestamptz', nullable: true })
  graceUsedAt: Date | null;

  @ManyToOne(() => DeviceSession, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'session_id' })
  session?: DeviceSession;
}
