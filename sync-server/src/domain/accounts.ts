import type { DataSource } from 'typeorm';

import type { AccountUser, LoginInput, RegisterInput, SignedIn } from '../../../shared/api/auth';
import type { ServerConfig } from '../config';
import { AppError } from '../errors';
import { describeError, logSecurityEvent } from '../safe-log';
import { User } from '../data-access/entities/user.entity';
import { PasswordFailures } from '../data-access/password-failures';
import { ownedUploadIds, removeOrphanedUploads } from '../data-access/upload-store';
import { welcomeMail } from './account-mail';
import type { DeviceSessions } from './device-sessions';
import type { EmailVerification } from './email-verification';
import type { Mailer } from '../mail/mailer';
import { hashPassword, verifyPassword } from './passwords';
import { forgetUser } from './session-checks';

/** The same answer for an unknown e-mail and a wrong password, so neither can be probed. */
const SIGN_IN_REFUSED = new AppError(401, 'invalid_credentials', 'E-mail or password is not right');

/** 429 while an account (or a signed-in reader) must wait after wrong passwords. */
function tooManyWrongPasswords(seconds: number): AppError {
  const minutes = Math.ceil(seconds / 60);
  return new AppError(429, 'too_many_attempts', `Too many wrong passwords; try again in ${minutes === 1 ? 'a minute' : `${minutes} minutes`}`, undefined, {
    'Retry-After': String(seconds),
  });
}

/** A hash to compare against when the e-mail is unknown, so both paths take as long. */
let decoyHash: Promise<string> | undefined;

export function publicUser(user: User): AccountUser {
  return { id: user.id, email: user.email, displayName: user.displayName, role: user.role };
}

/** Registration, sign-in, password change and account deletion. */
export class Accounts {
  private readonly failures: PasswordFailures;

  constructor(
    private readonly dataSource: DataSource,
    private readonly config: ServerConfig,
    private readonly sessions: DeviceSessions,
    private readonly mailer: Mailer,
    private readonly verification: EmailVerification,
  ) {
    this.failures = new PasswordFailures(dataSource);
  }

  /**
   * Checks a password under the per-key backoff: refuses at once while `key` must wait, counts
   * a wrong password, clears the count on a right one. Unknown e-mails count too, so the wait
   * says nothing about whether an account exists.
   */
  private async checkPassword(key: string, password: string, hash: string): Promise<boolean> {
    const wait = await this.failures.secondsToWait(key);
    if (wait > 0) throw tooManyWrongPasswords(wait);
    const right = await verifyPassword(password, hash, this.config);
    if (right) {
      await this.failures.succeed(key);
    } else if ((await this.failures.fail(key)) > 0) {
      // The e-mail is not logged: the user id when the key names one, else only that it was a sign-in.
      logSecurityEvent('wrong passwords: backoff started', key.startsWith('user:') ? { user: key.slice(5) } : { for: 'sign-in' });
    }
    return right;
  }

  private get users() {
    return this.dataSource.getRepository(User);
  }

  async register(input: RegisterInput, userAgent?: string): Promise<SignedIn> {
    if (await this.users.existsBy({ email: input.email })) {
      throw new AppError(409, 'email_taken', 'An account already uses this e-mail', { email: 'An account already uses this e-mail' });
    }
    const passwordHash = await hashPassword(input.password, this.config.bcryptCost, this.config);
    const role = input.email === this.config.adminEmail ? 'admin' : 'reader';
    let user: User;
    try {
      user = await this.users.save(this.users.create({ email: input.email, displayName: input.displayName, passwordHash, role }));
    } catch (err) {
      // Two registrations racing for one address: the unique index decides.
      if ((err as { code?: string }).code === '23505') {
        throw new AppError(409, 'email_taken', 'An account already uses this e-mail', { email: 'An account already uses this e-mail' });
      }
      throw err;
    }
    const tokens = await this.sessions.start(user, userAgent, input.deviceName, input.deviceId);
    // The welcome note must not hold up or fail the registration.
    const welcome = this.verification.link(user).then((link) => this.mailer.send(welcomeMail(user.email, link, this.config.publicUrl)));
    welcome.catch((err: unknown) => {
      console.warn(`welcome e-mail to user ${user.id} not sent: ${describeError(err)}`);
    });
    return { user: publicUser(user), ...tokens };
  }

  async login(input: LoginInput, userAgent?: string): Promise<SignedIn> {
    const user = await this.users.findOneBy({ email: input.email });
    decoyHash ??= hashPassword('decoy password for unknown e-mails', this.config.bcryptCost, this.config).catch((err: unknown) => {
      decoyHash = undefined;
      throw err;
    });
    const hash = user?.passwordHash ?? (await decoyHash);
    if (!(await this.checkPassword(`account:${input.email}`, input.password, hash)) || !user) throw SIGN_IN_REFUSED;
    if (user.disabledAt) throw new AppError(403, 'account_disabled', 'This account is disabled; ask an admin to enable it');
    const tokens = await this.sessions.start(user, userAgent, input.deviceName, input.deviceId);
    return { user: publicUser(user), ...tokens };
  }

  async find(userId: string): Promise<User> {
    const user = await this.users.findOneBy({ id: userId });
    if (!user) throw new AppError(401, 'unauthenticated', 'This account no longer exists');
    return user;
  }

  /** Changes the password and signs out every other device (a common precaution). */
  async changePassword(userId: string, sessionId: string, currentPassword: string, newPassword: string): Promise<void> {
    const user = await this.find(userId);
    if (!(await this.checkPassword(`user:${userId}`, currentPassword, user.passwordHash))) {
      throw new AppError(400, 'invalid_input', 'The current password is not right', { currentPassword: 'The current password is not right' });
    }
    const passwordHash = await hashPassword(newPassword, this.config.bcryptCost, this.config);
    await this.dataSource.transaction(async (manager) => {
      await manager.update(User, { id: userId }, { passwordHash });
      await this.sessions.revokeAll(manager, userId, sessionId);
    });
    forgetUser(userId);
  }

  /**
   * Deletes the account and, through foreign keys, everything it owns, including its ownership
   * of uploads. Images that no other reader owns go too, in the same transaction.
   */
  async deleteAccount(userId: string, password: string): Promise<void> {
    const user = await this.find(userId);
    if (!(await this.checkPassword(`user:${userId}`, password, user.passwordHash))) {
      throw new AppError(400, 'invalid_input', 'The password is not right', { password: 'The password is not right' });
    }
    await this.dataSource.transaction(async (manager) => {
      const uploadIds = await ownedUploadIds(manager, userId);
      await manager.delete(User, { id: userId });
      await removeOrphanedUploads(manager, uploadIds);
    });
    forgetUser(userId);
  }
}
