import { createCipheriv, createDecipheriv, hkdfSync, randomBytes } from 'node:crypto';

/**
 * Pull cursors, sealed. Inside is a position in the server-wide change sequence, which would tell
 * a reader how much everyone else writes; so the cursor is AES-256-GCM (NIST SP 800-38D) over the
 * position, with the reader's id as associated data: it reveals nothing, cannot be forged or
 * altered, and another reader's cursor does not open. The key is derived from the server secret
 * with HKDF (RFC 5869), so every instance agrees without a new setting.
 */
export class PullCursors {
  private readonly key: Buffer;

  constructor(serverSecret: Uint8Array) {
    this.key = Buffer.from(hkdfSync('sha256', serverSecret, Buffer.alloc(0), 'lamplight pull cursor v2', 32));
  }

  seal(userId: string, seq: number): string {
    const iv = randomBytes(12);
    const cipher = createCipheriv('aes-256-gcm', this.key, iv).setAAD(Buffer.from(userId));
    const body = Buffer.alloc(8);
    body.writeBigUInt64BE(BigInt(seq));
    return Buffer.concat([Buffer.from([2]), iv, cipher.update(body), cipher.final(), cipher.getAuthTag()]).toString('base64url');
  }

  /** Whether a cursor is sealed in this version (a `v1` one is sealed afresh when handed back). */
  isCurrent(cursor: string): boolean {
    return /^A[A-Za-z0-9_-]{49}$/.test(cursor);
  }

  /** The position, or `null` when the cursor is not one this server sealed for this reader. */
  open(userId: string, cursor: string): number | null {
    const bytes = Buffer.from(cursor, 'base64url');
    if (bytes.length === 1 + 12 + 8 + 16 && bytes[0] === 2) {
      try {
        const decipher = createDecipheriv('aes-256-gcm', this.key, bytes.subarray(1, 13)).setAAD(Buffer.from(userId));
        decipher.setAuthTag(bytes.subarray(21));
        return Number(Buffer.concat([decipher.update(bytes.subarray(13, 21)), decipher.final()]).readBigUInt64BE());
      } catch {
        return null;
      }
    }
    // Cursors from before they were sealed (`v1:<seq>`), accepted once so devices need not pull everything again.
    const legacy = /^v1:(\d{1,18})$/.exec(bytes.toString());
    return legacy ? Number(legacy[1]) : null;
  }
}
