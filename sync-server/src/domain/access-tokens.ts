import { errors, jwtVerify, SignJWT } from 'jose';

import type { Role } from '../data-access/entities/user.entity';

/** RFC 8725 §3.1: verify only with the algorithm we sign with; `none` and others are refused. */
const ALGORITHMS = ['HS256'];
/** RFC 8725 §3.8/§3.9: tokens name who issued them and for whom; both are checked. */
export const TOKEN_ISSUER = 'lamplight';
export const TOKEN_AUDIENCE = 'lamplight-app';
/** Short-lived: a stolen access token is only useful for minutes. */
export const ACCESS_TOKEN_SECONDS = 15 * 60;

export interface AccessClaims {
  readonly userId: string;
  readonly sessionId: string;
  readonly role: Role;
}

/**
 * Signs an access token. HS256 is deterministic, so the same claims and `issuedAt` (seconds) give
 * the same token: a refresh retried within the grace window gets back exactly the pair it missed.
 */
export function signAccessToken(claims: AccessClaims, secret: Uint8Array, issuedAt = Math.floor(Date.now() / 1000)): Promise<string> {
  return new SignJWT({ sid: claims.sessionId, role: claims.role })
    .setProtectedHeader({ alg: 'HS256', typ: 'JWT' })
    .setSubject(claims.userId)
    .setIssuer(TOKEN_ISSUER)
    .setAudience(TOKEN_AUDIENCE)
    .setIssuedAt(issuedAt)
    .setExpirationTime(issuedAt + ACCESS_TOKEN_SECONDS)
    .sign(secret);
}

export type VerifyResult = { ok: true; claims: AccessClaims; expiresAt: number } | { ok: false; reason: 'expired' | 'invalid' };

/** Past this many tokens the memory of verified ones starts over rather than growing without bound. */
const MAX_VERIFIED = 20_000;

/**
 * Remembers tokens whose signature was checked, so a device syncing every few seconds with the
 * same access token costs one HMAC per token, not one per request. The exact token string is the
 * key (a changed byte is a different token, checked afresh); expiry is still checked on every use.
 */
export class VerifiedTokens {
  private readonly tokens = new Map<string, { claims: AccessClaims; expiresAt: number }>();

  constructor(private readonly secret: Uint8Array) {}

  async verify(token: string, now = Date.now()): Promise<VerifyResult> {
    const known = this.tokens.get(token);
    if (known) return known.expiresAt > now ? { ok: true, ...known } : { ok: false, reason: 'expired' };
    const result = await verifyAccessToken(token, this.secret);
    if (result.ok) {
      if (this.tokens.size >= MAX_VERIFIED) this.tokens.clear();
      this.tokens.set(token, { claims: result.claims, expiresAt: result.expiresAt });
    }
    return result;
  }
}

/** Checks signature, algorithm, issuer, audience and expiry; never throws. */
export async function verifyAccessToken(token: string, secret: Uint8Array): Promise<VerifyResult> {
  try {
    const { payload } = await jwtVerify(token, secret, {
      algorithms: ALGORITHMS,
      issuer: TOKEN_ISSUER,
      audience: TOKEN_AUDIENCE,
      requiredClaims: ['sub', 'exp', 'iat'],
    });
    const { sub, sid, role, exp } = payload as { sub?: unknown; sid?: unknown; role?: unknown; exp: number };
    if (typeof sub !== 'string' || typeof sid !== 'string' || (role !== 'reader' && role !== 'admin')) {
      return { ok: false, reason: 'invalid' };
    }
    return { ok: true, claims: { userId: sub, sessionId: sid, role }, expiresAt: exp * 1000 };
  } catch (err) {
    return { ok: false, reason: err instanceof errors.JWTExpired ? 'expired' : 'invalid' };
  }
}
