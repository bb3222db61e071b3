/**
 * Password rules after NIST SP 800-63B-4 §3.1.1.2 for a password used as a single factor:
 * at least 15 characters, at least 64 allowed, no composition rules (no "one digit, one symbol"),
 * every Unicode code point counts as one character, and values known to be commonly used or
 * context-specific (the service's name, the reader's own address) are refused.
 */
export const PASSWORD_MIN_LENGTH = 15;
/** Far above NIST's "at least 64"; the bound only keeps a request body reasonable. */
export const PASSWORD_MAX_LENGTH = 256;

/**
 * A small blocklist of common long passwords and keyboard runs (common practice: lists of
 * breached passwords are dominated by these shapes). Compared lower-cased, spaces removed.
 */
const COMMON_PASSWORDS: ReadonlySet<string> = new Set([
  'passwordpassword',
  'password1234567',
  'password12345678',
  'password123456789',
  '123456789012345',
  '1234567890123456',
  '12345678901234567890',
  'qwertyuiopasdfg',
  'qwertyuiopasdfgh',
  'qwertyuiopasdfghjkl',
  'qwertyuiop123456',
  '1qaz2wsx3edc4rfv',
  'iloveyouiloveyou',
  'letmeinletmein',
  'letmeinletmein1',
  'welcomewelcome1',
  'correcthorsebatterystaple',
  'abcdefghijklmnop',
  'abcdefghijklmnopqrstuvwxyz',
  'trustno1trustno1',
  'changemechangeme',
  'myreadingjournal',
  'ilovereadingbooks',
  'booksbooksbooks',
]);

export interface PasswordContext {
  readonly email?: string;
  readonly displayName?: string;
}

/**
 * Says what is wrong with a new password, or `null` when it may be used.
 *
 * @example
 * checkPassword('short') // 'Use at least 15 characters'
 * checkPassword('a quiet orchard at dusk') // null
 */
export function checkPassword(password: string, context: PasswordContext = {}): string | null {
  const length = Array.from(password.normalize('NFC')).length;
  if (length < PASSWORD_MIN_LENGTH) return `Use at least ${PASSWORD_MIN_LENGTH} characters`;
  if (length > PASSWORD_MAX_LENGTH) return `Use at most ${PASSWORD_MAX_LENGTH} characters`;

  const folded = password.toLowerCase().replace(/\s+/g, '');
  if (COMMON_PASSWORDS.has(folded)) return 'This password is too common; choose another';
  if (/^(.)\1+$/u.test(folded)) return 'Repeating one character is too easy to guess';

  const letters = folded.replace(/[^\p{L}]/gu, '');
  const contextWords = ['lamplight', context.email?.split('@')[0], context.displayName]
    .map((word) => word?.toLowerCase().replace(/[^\p{L}]/gu, ''))
    .filter((word): word is string => !!word && word.length >= 3);
  if (contextWords.some((word) => letters.length > 0 && word.repeat(Math.ceil(letters.length / word.length)).startsWith(letters))) {
    return 'Avoid a password made only of your name, address or the app’s name';
  }
  if (context.email && folded === context.email.toLowerCase()) return 'Do not use your e-mail address as the password';
  return null;
}
