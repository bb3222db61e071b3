import { IsNull, MoreThan, type DataSource } from 'typeorm';

import type { ServerConfig } from '../config';
import { AppError } from '../errors';
import { PasswordReset } from '../data-access/entities/password-reset.entity';
import { User } from '../data-access/entities/user.entity';
import { passwordResetMail, RESET_LINK_MINUTES } from './account-mail';
import type { DeviceSessions } from './device-sessions';
import type { Mailer } from '../mail/mailer';
import { hashPassword } from './passwords';
import { hashSecretToken, newSecretToken } from './secret-tokens';
import { forgetUser } from './session-checks';

/** Password reset by e-mail: a single-use link, valid for 30 minutes, stored hashed. */
export class PasswordResets {
  constructor(
    private readonly dataSource: DataSource,
    private readonly config: ServerConfig,
    private readonly sessions: DeviceSessions,
    private readonly mailer: Mailer,
  ) {}

  /**
   * Sends a link when the address has an account. The caller answers the same either way and
   * does not wait for this, so the answer's timing does not tell whether the address exists.
   */
  async request(email: string): Promise<void> {
    const user = await this.dataSource.getRepository(User).findOneBy({ email });
    if (!user || user.disabledAt) return;
    const token = newSecretToken();
    await this.dataSource.getRepository(PasswordReset).insert({
      userId: user.id,
      tokenHash: hashSecretToken(token),
      expiresAt: new Date(Date.now() + RESET_LINK_MINUTES * 60_000),
    });
    // In the fragment, the token is never sent to a server in a request line or a Referer.
    const link = `${this.config.publicUrl}/reset-password#token=${token}`;
    // The display name is someone's own words: only to an address its owner has confirmed.
    await this.mailer.send(passwordResetMail(user.email, user.emailVerifiedAt ? user.displayName : null, link));
  }

  /** Sets the new password and signs the reader out everywhere. */
  async confirm(token: string, newPassword: string): Promise<void> {
    const passwordHash = await hashPassword(newPassword, this.config.bcryptCost, this.config);
    let forgotten: string | undefined;
    const done = await this.dataSource.transaction(async (manager) => {
      // Marking it used in the statement that finds it makes a second use impossible. (A CTE,
      // because TypeORM returns plain rows only for SELECT.)
      const rows: { user_id: string }[] = await manager.query(
        `WITH used AS (
           UPDATE password_resets SET used_at = now()
            WHERE token_hash = $1 AND used_at IS NULL AND expires_at > now()
            RETURNING user_id)
         SELECT user_id FROM used`,
        [hashSecretToken(token)],
      );
      const userId = rows[0]?.user_id;
      if (!userId) return false;
      await manager.update(User, { id: userId }, { passwordHash });
      await this.sessions.revokeAll(manager, userId);
      await manager.update(PasswordReset, { userId, usedAt: IsNull(), expiresAt: MoreThan(new Date()) }, { usedAt: new Date() });
      forgotten = userId;
      return true;
    });
    if (forgotten) forgetUser(forgotten);
    if (!done) {
      throw new AppError(400, 'reset_link_invalid', 'This link was already used or has expired; ask for a new one', {
        token: 'This link was already used or has expired',
      });
    }
  }
}
