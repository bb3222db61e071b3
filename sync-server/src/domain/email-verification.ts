import { jwtVerify, SignJWT } from 'jose';
import type { DataSource } from 'typeorm';

import type { ServerConfig } from '../config';
import { AppError } from '../errors';
import { User } from '../data-access/entities/user.entity';
import { TOKEN_ISSUER } from './access-tokens';
import { verificationMail } from './account-mail';
import type { Mailer } from '../mail/mailer';

/** Days a verification link stays valid. */
export const VERIFY_LINK_DAYS = 7;
/** A verification link is not an access token: another audience, checked both ways (RFC 8725 §3.9). */
const VERIFY_AUDIENCE = 'lamplight-verify-email';

const LINK_INVALID = new AppError(400, 'verify_link_invalid', 'This link is not valid or has expired; ask for a new one from your account page', {
  token: 'is not valid or has expired',
});

/**
 * E-mail verification by signed link (HS256 over the user id and the address, so a link stops
 * working if the address changes). Until an address is verified, no mail sent to it carries
 * words another person could have chosen, such as a display name (OWASP Authentication Cheat Sheet).
 */
export class EmailVerification {
  constructor(
    private readonly dataSource: DataSource,
    private readonly config: ServerConfig,
    private readonly mailer: Mailer,
  ) {}

  /** The link to put in a mail to `user`; the token is in the fragment, never sent in a request line. */
  async link(user: Pick<User, 'id' | 'email'>): Promise<string> {
    const token = await new SignJWT({ email: user.email })
      .setProtectedHeader({ alg: 'HS256', typ: 'JWT' })
      .setSubject(user.id)
      .setIssuer(TOKEN_ISSUER)
      .setAudience(VERIFY_AUDIENCE)
      .setIssuedAt()
      .setExpirationTime(`${VERIFY_LINK_DAYS}d`)
      .sign(this.config.jwtSecret);
    return `${this.config.publicUrl}/verify-email#token=${token}`;
  }

  /** Marks the address verified if the link is good and still names the account's address. */
  async confirm(token: string): Promise<void> {
    let claims: { sub?: unknown; email?: unknown };
    try {
      ({ payload: claims } = await jwtVerify(token, this.config.jwtSecret, { algorithms: ['HS256'], issuer: TOKEN_ISSUER, audience: VERIFY_AUDIENCE }));
    } catch {
      throw LINK_INVALID;
    }
    if (typeof claims.sub !== 'string' || typeof claims.email !== 'string' || !/^[0-9a-f-]{36}$/.test(claims.sub)) throw LINK_INVALID;
    const users = this.dataSource.getRepository(User);
    const user = await users.findOneBy({ id: claims.sub });
    if (!user || user.email !== claims.email) throw LINK_INVALID;
    if (!user.emailVerifiedAt) await users.update({ id: user.id }, { emailVerifiedAt: new Date() });
  }

  /** Sends a fresh link to a signed-in reader whose address is not verified yet. */
  async resend(userId: string): Promise<'sent' | 'already_verified'> {
    const user = await this.dataSource.getRepository(User).findOneBy({ id: userId });
    if (!user) throw new AppError(401, 'unauthenticated', 'This account no longer exists');
    if (user.emailVerifiedAt) return 'already_verified';
    await this.mailer.send(verificationMail(user.email, await this.link(user)));
    return 'sent';
  }
}
