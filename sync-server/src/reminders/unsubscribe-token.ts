import { createHmac, timingSafeEqual } from 'node:crypto';

/** A key of its own for unsubscribe links, derived from the server secret. */
function key(serverSecret: Uint8Array): Buffer {
  return createHmac('sha256', serverSecret).update('lamplight loan-reminder unsubscribe').digest();
}

/**
 * The token of a reader's unsubscribe link: their id and an HMAC-SHA-256 of it. It works without
 * signing in and never expires (an old mail's link must still stop the mails); it can only stop
 * mails, so it carries nothing else.
 */
export function unsubscribeToken(userId: string, serverSecret: Uint8Array): string {
  const mac = createHmac('sha256', key(serverSecret)).update(userId, 'utf8').digest('base64url');
  return `${userId}.${mac}`;
}

/** The reader id a token was made for, or null for a token that was not made by this server. */
export function readUnsubscribeToken(token: string, serverSecret: Uint8Array): string | null {
  const match = /^([0-9a-f-]{36})\.([A-Za-z0-9_-]{43})$/.exec(token);
  if (!match) return null;
  const expected = Buffer.from(unsubscribeToken(match[1]!, serverSecret));
  const given = Buffer.from(token);
  return expected.length === given.length && timingSafeEqual(expected, given) ? match[1]! : null;
}
