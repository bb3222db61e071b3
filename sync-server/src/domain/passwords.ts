import { createHash } from 'node:crypto';

import bcrypt from 'bcryptjs';

/** bcrypt cost: OWASP Password Storage Cheat Sheet asks for at least 10. Specs lower it. */
export const DEFAULT_BCRYPT_COST = 10;

/**
 * bcrypt reads only the first 72 bytes of its input, so two long passphrases sharing a prefix
 * would hash alike. We feed it base64(SHA-256(password)) instead: 44 ASCII bytes that depend on
 * every byte of the password, of any length.
 */
function preDigest(password: string): string {
  return createHash('sha256').update(password.normalize('NFC'), 'utf8').digest('base64');
}

export function hashPassword(password: string, cost = DEFAULT_BCRYPT_COST): Promise<string> {
  return bcrypt.hash(preDigest(password), cost);
}

export function verifyPassword(password: string, hash: string): Promise<boolean> {
  return bcrypt.compare(preDigest(password), hash);
}
