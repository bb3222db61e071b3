import { createHash, createHmac, randomBytes } from 'node:crypto';

/** A random, URL-safe secret (refresh tokens, reset links): 256 bits from the OS. */
export function newSecretToken(): string {
  return randomBytes(32).toString('base64url');
}

/** What we store instead of the secret: a leaked table cannot be replayed. */
export function hashSecretToken(token: string): string {
  return createHash('sha256').update(token, 'utf8').digest('hex');
}

/**
 * The refresh token that replaces `token`: HMAC-SHA-256 under a key derived from the server
 * secret, so nobody without that key can compute it, and the server can compute it again.
 */
export function successorToken(token: string, serverSecret: Uint8Array): string {
  const key = createHmac('sha256', serverSecret).update('lamplight refresh-token successor').digest();
  return createHmac('sha256', key).update(token, 'utf8').digest('base64url');
}
