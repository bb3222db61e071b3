import { checkPassword, PASSWORD_MAX_LENGTH, PASSWORD_MIN_LENGTH } from './password-policy';

// Rules from NIST SP 800-63B-4 §3.1.1.2 (password verifiers, single-factor use).
describe('checkPassword', () => {
  it('asks for at least 15 characters (NIST SP 800-63B-4 §3.1.1.2)', () => {
    expect(PASSWORD_MIN_LENGTH).toBe(15);
    expect(checkPassword('fourteen chars')).toBe('Use at least 15 characters'); // 14
    expect(checkPassword('fifteen chars!!')).toBeNull(); // 15
  });

  it('allows at least 64 characters (NIST: "SHOULD permit a maximum length of at least 64")', () => {
    expect(PASSWORD_MAX_LENGTH).toBeGreaterThanOrEqual(64);
    expect(checkPassword('quiet harbour lanterns glowing softly over the slate-grey waters')).toBeNull(); // 64
    expect(checkPassword('w'.repeat(PASSWORD_MAX_LENGTH + 1))).toContain('at most');
  });

  it('counts each Unicode code point as one character (NIST §3.1.1.2)', () => {
    // 15 code points, three of them outside the BMP (two UTF-16 units each).
    expect(checkPassword('ñandú🌙🌙🌙 cielo!')).toBeNull();
    expect(checkPassword('ñandú🌙🌙🌙 cielo')).toBe('Use at least 15 characters'); // 14 code points, 17 units
    expect(checkPassword('🌙🌙🌙🌙🌙🌙🌙')).toBe('Use at least 15 characters'); // 7 code points, 14 UTF-16 units
  });

  it('imposes no composition rules: lower-case words alone are fine (NIST §3.1.1.2)', () => {
    expect(checkPassword('marmalade skies over the quay')).toBeNull();
  });

  it('refuses commonly used passwords and runs of one character', () => {
    expect(checkPassword('passwordpassword')).toContain('too common');
    expect(checkPassword('Password 1234567')).toContain('too common');
    expect(checkPassword('aaaaaaaaaaaaaaaaaa')).toContain('Repeating');
  });

  it('refuses context-specific words: the service name and the reader’s own name or address', () => {
    expect(checkPassword('LampLightLampLight')).toContain('app’s name');
    expect(checkPassword('wrenwrenwrenwren!', { email: 'wren@example.com' })).toContain('your name');
    expect(checkPassword('tamsin-tamsin-tamsin', { displayName: 'Tamsin' })).toContain('your name');
    // A phrase that merely contains the name is allowed.
    expect(checkPassword('lamplight over the long river', { email: 'wren@example.com' })).toBeNull();
  });
});
