import { createHash, randomBytes } from 'node:crypto';

/** A random, URL-safe secret (refresh tokens, reset links): 256 bits from the OS. */
export function newSecretToken(): string {
  return randomBytes(32).toString('base64url');
}

/** What we store instead of the secret: a leaked table cannot be replayed. */
export function hashSecretToken(token: string): string {
  return createHash('sha256').update(token, 'utf8').digest('hex');
}
