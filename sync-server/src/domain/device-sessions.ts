import { IsNull, type DataSource, type EntityManager } from 'typeorm';

import type { TokenPair } from '../../../shared/api/auth';
import { AppError } from '../errors';
import { logSecurityEvent } from '../safe-log';
import { DeviceSession } from '../data-access/entities/device-session.entity';
import { RefreshToken } from '../data-access/entities/refresh-token.entity';
import type { User } from '../data-access/entities/user.entity';
import { signAccessToken } from './access-tokens';
import { forgetSession, forgetUser } from './session-checks';
import { deviceNameFromUserAgent } from '../../../shared/account/device-name';
import { hashSecretToken, newSecretToken, successorToken } from './secret-tokens';

/** Readers stay signed in on a device for months of offline use; each refresh extends this. */
export const REFRESH_TOKEN_DAYS = 90;

/**
 * How long after a rotation the previous refresh token may be presented once more, and get the
 * same new pair: a client whose answer was lost on the way retries with the token it still
 * holds (RFC 9700 §4.14.2 allows such a grace period). After it, or a second time, reuse is theft.
 */
export const REFRESH_GRACE_SECONDS = 45;

const refreshExpiry = () => new Date(Date.now() + REFRESH_TOKEN_DAYS * 24 * 3600 * 1000);

/** Device sessions and their rotating refresh tokens (RFC 9700 §4.14.2). */
export class DeviceSessions {
  constructor(
    private readonly dataSource: DataSource,
    private readonly jwtSecret: Uint8Array,
  ) {}

  /**
   * The device session for a successful sign-in, with a fresh token pair. A browser that sends
   * its device id gets its live entry back rather than a new one, so signing in again does not
   * fill the device list; the refresh tokens the entry issued before are ended.
   */
  async start(user: User, userAgent: string | undefined, name?: string, deviceId?: string): Promise<TokenPair> {
    return this.dataSource.transaction(async (manager) => {
      const known = deviceId
        ? await manager
            .getRepository(DeviceSession)
            .createQueryBuilder('session')
            .where('session.userId = :userId AND session.deviceId = :deviceId AND session.revokedAt IS NULL', { userId: user.id, deviceId })
            .orderBy('session.lastSeenAt', 'DESC')
            .setLock('pessimistic_write')
            .getOne()
        : null;
      let sessionId: string;
      if (known) {
        sessionId = known.id;
        await manager.update(DeviceSession, { id: sessionId }, { lastSeenAt: new Date(), userAgent: (userAgent ?? '').slice(0, 500), ...(name ? { name } : {}) });
        await manager
          .createQueryBuilder()
          .update(RefreshToken)
          .set({ expiresAt: () => 'now()' })
          .where('session_id = :sessionId AND used_at IS NULL', { sessionId })
          .execute();
      } else {
        const session = await manager.save(
          manager.create(DeviceSession, {
            userId: user.id,
            deviceId: deviceId ?? null,
            name: name ?? deviceNameFromUserAgent(userAgent),
            userAgent: (userAgent ?? '').slice(0, 500),
          }),
        );
        sessionId = session.id;
      }
      await manager.update('users', { id: user.id }, { lastSeenAt: new Date() });
      return this.issue(manager, sessionId, user);
    });
  }

  /**
   * Exchanges a refresh token for a new pair. The new refresh token is derived from the old one
   * (an HMAC under a server key), so within the grace window the old token can be answered with
   * the very same pair without storing any token in clear. A token presented again outside that
   * window, or twice within it, or after its successor was used, means two parties hold it (one
   * perhaps an attacker), so the whole family is revoked.
   */
  async rotate(refreshToken: string): Promise<TokenPair> {
    const tokenHash = hashSecretToken(refreshToken);
    type Outcome = { pair: TokenPair } | { error: 'unknown' | 'revoked' | 'reused' | 'expired' | 'disabled' };
    let revokedSession: string | undefined;
    const outcome = await this.dataSource.transaction(async (manager): Promise<Outcome> => {
      const token = await manager
        .getRepository(RefreshToken)
        .createQueryBuilder('token')
        .innerJoinAndSelect('token.session', 'session')
        .innerJoinAndSelect('session.user', 'user')
        .where('token.tokenHash = :tokenHash', { tokenHash })
        .setLock('pessimistic_write', undefined, ['token', 'session'])
        .getOne();
      if (!token || !token.session?.user) return { error: 'unknown' };
      const { session } = token;
      const user = session.user!;
      if (session.revokedAt) return { error: 'revoked' };
      if (user.disabledAt) return { error: 'disabled' };
      const successor = successorToken(refreshToken, this.jwtSecret);
      if (token.usedAt) {
        if (await this.withinGrace(manager, token, successor)) {
          await manager.update(RefreshToken, { id: token.id }, { graceUsedAt: new Date() });
          return { pair: await this.pairFor(session.id, user, successor, token.usedAt) };
        }
        await manager.update(DeviceSession, { id: session.id }, { revokedAt: new Date() });
        revokedSession = session.id;
        logSecurityEvent('refresh token presented again; device session revoked', { user: user.id, session: session.id });
        return { error: 'reused' };
      }
      if (token.expiresAt.getTime() <= Date.now()) return { error: 'expired' };

      const usedAt = new Date(Math.floor(Date.now() / 1000) * 1000);
      await manager.update(RefreshToken, { id: token.id }, { usedAt });
      await manager.update(DeviceSession, { id: session.id }, { lastSeenAt: new Date() });
      await manager.update('users', { id: user.id }, { lastSeenAt: new Date() });
      await manager.insert(RefreshToken, { sessionId: session.id, tokenHash: hashSecretToken(successor), expiresAt: refreshExpiry() });
      return { pair: await this.pairFor(session.id, user, successor, usedAt) };
    });
    if (revokedSession) forgetSession(revokedSession);
    if ('pair' in outcome) return outcome.pair;
    if (outcome.error === 'disabled') throw new AppError(403, 'account_disabled', 'This account is disabled');
    const messages = {
      unknown: 'This sign-in is not known; sign in again',
      revoked: 'This device was signed out; sign in again',
      reused: 'This sign-in was used twice, so it was ended for safety; sign in again',
      expired: 'This sign-in has expired; sign in again',
    } as const;
    throw new AppError(401, `refresh_${outcome.error}`, messages[outcome.error]);
  }

  /** Whether a rotated token may be answered once more: recently rotated, not yet retried, successor unused. */
  private async withinGrace(manager: EntityManager, token: RefreshToken, successor: string): Promise<boolean> {
    if (token.graceUsedAt || !token.usedAt || token.usedAt.getTime() < Date.now() - REFRESH_GRACE_SECONDS * 1000) return false;
    const next = await manager.findOne(RefreshToken, { where: { tokenHash: hashSecretToken(successor) }, lock: { mode: 'pessimistic_write' } });
    return next !== null && next.usedAt === null;
  }

  /** The pair a rotation at `rotatedAt` answers; the same every time it is asked for. */
  private async pairFor(sessionId: string, user: User, refreshToken: string, rotatedAt: Date): Promise<TokenPair> {
    const accessToken = await signAccessToken({ userId: user.id, sessionId, role: user.role }, this.jwtSecret, Math.floor(rotatedAt.getTime() / 1000));
    return { accessToken, refreshToken };
  }

  /** Ends a device session and every refresh token it issued. */
  async revoke(userId: string, sessionId: string): Promise<boolean> {
    const result = await this.dataSource.getRepository(DeviceSession).update({ id: sessionId, userId, revokedAt: IsNull() }, { revokedAt: new Date() });
    forgetSession(sessionId);
    return (result.affected ?? 0) > 0;
  }

  /** Ends every session of a reader, optionally keeping one (after a password change). */
  async revokeAll(manager: EntityManager, userId: string, keepSessionId?: string): Promise<void> {
    const query = manager
      .createQueryBuilder()
      .update(DeviceSession)
      .set({ revokedAt: () => 'now()' })
      .where('user_id = :userId AND revoked_at IS NULL', { userId });
    if (keepSessionId) query.andWhere('id <> :keepSessionId', { keepSessionId });
    await query.execute();
    // Callers forget again once their transaction commits, so no request in between keeps the old answer.
    forgetUser(userId);
  }

  list(userId: string): Promise<DeviceSession[]> {
    return this.dataSource.getRepository(DeviceSession).find({
      where: { userId, revokedAt: IsNull() },
      order: { lastSeenAt: 'DESC' },
    });
  }

  async rename(userId: string, sessionId: string, name: string): Promise<DeviceSession | null> {
    const sessions = this.dataSource.getRepository(DeviceSession);
    const result = await sessions.update({ id: sessionId, userId, revokedAt: IsNull() }, { name });
    return (result.affected ?? 0) > 0 ? sessions.findOneBy({ id: sessionId }) : null;
  }

  private async issue(manager: EntityManager, sessionId: string, user: User): Promise<TokenPair> {
    const refreshToken = newSecretToken();
    await manager.insert(RefreshToken, { sessionId, tokenHash: hashSecretToken(refreshToken), expiresAt: refreshExpiry() });
    const accessToken = await signAccessToken({ userId: user.id, sessionId, role: user.role }, this.jwtSecret);
    return { accessToken, refreshToken };
  }
}
