import fc from 'fast-check';

import { expectProperty } from '../testing/expect-property';
import { formatJoinCode, invitationProblem, joinCodeFrom, JOIN_CODE_ALPHABET, normalizeJoinCode } from './invitations';

const now = new Date('2026-12-04T12:00:00Z');

describe('invitations', () => {
  it('works once, before it expires, unless withdrawn', () => {
    const fresh = { expiresAt: new Date('2026-12-05T12:00:00Z'), usedAt: null };
    expect(invitationProblem(fresh, now)).toBeNull();
    expect(invitationProblem({ ...fresh, usedAt: now }, now)).toBe('used');
    expect(invitationProblem({ ...fresh, expiresAt: now }, now)).toBe('expired');
    expect(invitationProblem({ ...fresh, revokedAt: now }, now)).toBe('revoked');
    expect(invitationProblem(undefined, now)).toBe('unknown');
  });

  it('forgives case, spaces and dashes in a typed join code and refuses look-alikes', () => {
    expect(normalizeJoinCode(' abcde-fghjk ')).toBe('ABCDEFGHJK');
    expect(normalizeJoinCode('ABCDE FGHJ0')).toBeNull(); // 0 is not in the alphabet
    expect(normalizeJoinCode('ABCD')).toBeNull();
    expect(formatJoinCode('ABCDEFGHJK')).toBe('ABCDE-FGHJK');
  });

  it('makes codes of the alphabet that read back as themselves, whatever the random bytes', () => {
    expectProperty(
      fc.property(fc.uint8Array({ minLength: 1, maxLength: 32 }), (bytes) => {
        let calls = 0;
        // Bytes past the rejection limit are skipped, so later calls give fresh small bytes.
        const code = joinCodeFrom(() => (calls++ === 0 ? bytes : Uint8Array.from({ length: 16 }, (_, i) => i * 7)));
        return code.length === 10 && [...code].every((char) => JOIN_CODE_ALPHABET.includes(char)) && normalizeJoinCode(formatJoinCode(code)) === code;
      }),
    );
  });
});
