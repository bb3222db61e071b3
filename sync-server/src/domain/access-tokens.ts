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

export type VerifyResult = { ok: true; claims: AccessClaims } | { ok: false; reason: 'expired' | 'invalid' };

/** Checks signature, algorithm, issuer, audience and expiry; never throws. */
export async function verifyAccessToken(token: string, secret: Uint8Array): Promise<VerifyResult> {
  try {
    const { payload } = await jwtVerify(token, secret, {
      algorithms: ALGORITHMS,
      issuer: TOKEN_ISSUER,
      audience: TOKEN_AUDIENCE,
      requiredClaims: ['sub', 'exp', 'iat'],
    });
    const { sub, sid, role } = payload as { sub?: unknown; sid?: unknown; role?: unknown };
    if (typeof sub !== 'string' || typeof sid !== 'string' || (role !== 'reader' && role !== 'admin')) {
      return { ok: false, reason: 'invalid' };
    }
    return { ok: true, claims: { userId: sub, sessionId: sid, role } };
  } catch (err) {
    return { ok: false, reason: err instanceof errors.JWTExpired ? 'expired' : 'invalid' };
  }
}
