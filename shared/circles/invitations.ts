/** Days an e-mail invitation stays valid. */
export const INVITATION_DAYS = 7;

/** A stored invitation as the rule sees it. */
export interface InvitationState {
  readonly expiresAt: Date;
  readonly usedAt: Date | null;
  readonly revokedAt?: Date | null;
}

export type InvitationProblem = 'used' | 'expired' | 'revoked';

/** Whether an invitation link can still be used at `now`: single use, expiring, revocable. */
export function invitationProblem(invitation: InvitationState | undefined, now: Date): InvitationProblem | 'unknown' | null {
  if (!invitation) return 'unknown';
  if (invitation.revokedAt) return 'revoked';
  if (invitation.usedAt) return 'used';
  if (now.getTime() >= invitation.expiresAt.getTime()) return 'expired';
  return null;
}

/** What a reader is told for each problem. */
export const INVITATION_PROBLEM_TEXT: Readonly<Record<InvitationProblem | 'unknown', string>> = {
  unknown: 'This invitation is not valid; ask the host for a new one',
  used: 'This invitation has already been used; ask the host for a new one',
  expired: 'This invitation has expired; ask the host for a new one',
  revoked: 'This invitation was withdrawn by the host',
};

/**
 * Join codes: 10 characters from an alphabet without look-alikes (no 0/O, 1/I/L), shown as
 * two groups of five. Readers type them, so case, spaces and dashes are forgiven.
 */
export const JOIN_CODE_ALPHABET = 'ABCDEFGHJKMNPQRSTUVWXYZ23456789';
export const JOIN_CODE_LENGTH = 10;

/** The code as stored, from whatever a reader typed; `null` when it cannot be a code. */
export function normalizeJoinCode(typed: string): string | null {
  const code = typed.toUpperCase().replace(/[\s-]/g, '');
  if (code.length !== JOIN_CODE_LENGTH) return null;
  for (const char of code) if (!JOIN_CODE_ALPHABET.includes(char)) return null;
  return code;
}

/** `ABCDE-FGHJK`, for showing. */
export const formatJoinCode = (code: string): string => `${code.slice(0, 5)}-${code.slice(5)}`;

/** A join code from random bytes (one byte per character; rejection sampling keeps it uniform). */
export function joinCodeFrom(randomBytes: () => Uint8Array): string {
  const limit = 256 - (256 % JOIN_CODE_ALPHABET.length);
  let code = '';
  while (code.length < JOIN_CODE_LENGTH) {
    for (const byte of randomBytes()) {
      if (byte < limit && code.length < JOIN_CODE_LENGTH) code += JOIN_CODE_ALPHABET[byte % JOIN_CODE_ALPHABET.length];
    }
  }
  return code;
}
