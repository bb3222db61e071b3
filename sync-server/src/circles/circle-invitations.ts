import { randomUUID } from 'node:crypto';

import { jwtVerify, SignJWT } from 'jose';
import type { DataSource } from 'typeorm';

import { INVITATION_DAYS, INVITATION_PROBLEM_TEXT, invitationProblem } from '../../../shared/circles/invitations';
import type { ServerConfig } from '../config';
import { TOKEN_ISSUER } from '../domain/access-tokens';
import { AppError } from '../errors';
import type { Mailer } from '../mail/mailer';
import { addMember } from './circle-membership';
import { roleIn } from './circle-sync-store';
import { invitationMail } from './circle-mail';

/** An invitation link is not an access token: another audience, checked both ways (RFC 8725 §3.9). */
const INVITE_AUDIENCE = 'lamplight-circle-invite';

const refused = (problem: keyof typeof INVITATION_PROBLEM_TEXT) =>
  new AppError(400, `invitation_${problem}`, INVITATION_PROBLEM_TEXT[problem], { token: INVITATION_PROBLEM_TEXT[problem] });

/**
 * Invitations by e-mail: a signed link (HS256, naming the invitation and its circle, expiring
 * after {@link INVITATION_DAYS} days) whose invitation row makes it single-use and lets it be
 * withdrawn. Whoever opens it signed in joins; the link goes only to the invited address.
 */
export class CircleInvitations {
  constructor(
    private readonly dataSource: DataSource,
    private readonly config: ServerConfig,
    private readonly mailer: Mailer,
  ) {}

  async invite(circleId: string, hostId: string, email: string): Promise<void> {
    if ((await roleIn(this.dataSource.manager, circleId, hostId)) !== 'host') throw new AppError(403, 'not_a_host', 'Only a host can invite');
    const id = randomUUID();
    const expiresAt = new Date(Date.now() + INVITATION_DAYS * 86_400_000);
    await this.dataSource.query('INSERT INTO circle_invitations (id, circle_id, email, invited_by, expires_at) VALUES ($1, $2, $3, $4, $5)', [
      id,
      circleId,
      email,
      hostId,
      expiresAt,
    ]);
    const token = await new SignJWT({ circle: circleId })
      .setProtectedHeader({ alg: 'HS256', typ: 'JWT' })
      .setJti(id)
      .setIssuer(TOKEN_ISSUER)
      .setAudience(INVITE_AUDIENCE)
      .setIssuedAt()
      .setExpirationTime(Math.floor(expiresAt.getTime() / 1000))
      .sign(this.config.jwtSecret);
    // In the fragment: the token never travels in a request line or a Referer.
    await this.mailer.send(invitationMail(email, `${this.config.publicUrl}/circles/join#invite=${token}`));
  }

  /** Joins the circle the link names, once; answers the circle's id. */
  async accept(userId: string, token: string): Promise<{ id: string }> {
    let claims: { jti?: unknown; circle?: unknown };
    try {
      ({ payload: claims } = await jwtVerify(token, this.config.jwtSecret, { algorithms: ['HS256'], issuer: TOKEN_ISSUER, audience: INVITE_AUDIENCE }));
    } catch (error) {
      throw refused((error as { code?: string }).code === 'ERR_JWT_EXPIRED' ? 'expired' : 'unknown');
    }
    if (typeof claims.jti !== 'string' || typeof claims.circle !== 'string') throw refused('unknown');
    const { jti, circle } = claims;
    return this.dataSource.transaction(async (manager) => {
      const [row] = (await manager.query('SELECT circle_id, expires_at, used_at FROM circle_invitations WHERE id = $1 FOR UPDATE', [jti])) as {
        circle_id: string;
        expires_at: Date;
        used_at: Date | null;
      }[];
      const problem = invitationProblem(row && row.circle_id === circle ? { expiresAt: row.expires_at, usedAt: row.used_at } : undefined, new Date());
      if (problem) throw refused(problem);
      await manager.query('UPDATE circle_invitations SET used_at = now(), used_by = $2 WHERE id = $1', [jti, userId]);
      await addMember(manager, circle, userId);
      return { id: circle };
    });
  }
}
