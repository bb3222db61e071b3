import * as z from 'zod';

import { DISPLAY_NAME_MAX_LENGTH } from '../account/display-name';
import { checkPassword } from '../account/password-policy';
import { isPlainText, PLAIN_TEXT_MESSAGE } from '../account/plain-text';

/**
 * The accounts API (`/api/auth`: register, login, refresh, sign out, password change and resets,
 * e-mail confirmation): the inputs both sides validate and the answers the server sends.
 */

export { DISPLAY_NAME_MAX_LENGTH };

const email = z
  .string({ error: 'E-mail is required' })
  .trim()
  .toLowerCase()
  .pipe(z.email({ error: 'Enter an e-mail address like name@example.com' }).max(254, 'E-mail is too long'));

const displayName = z
  .string({ error: 'Name is required' })
  .trim()
  .min(1, 'Name is required')
  .max(DISPLAY_NAME_MAX_LENGTH, `Use at most ${DISPLAY_NAME_MAX_LENGTH} characters`)
  .refine(isPlainText, PLAIN_TEXT_MESSAGE);

const deviceName = z.string().trim().min(1).max(80).refine(isPlainText, PLAIN_TEXT_MESSAGE).optional();
/** The browser's own id (the node id of its clocks), so signing in again reuses its device entry. */
const deviceId = z
  .string({ error: 'Use the id this browser made for itself' })
  .regex(/^[A-Za-z0-9-]{1,64}$/, 'Use letters, digits and hyphens, at most 64')
  .optional();

/** A new password, checked against the shared policy (NIST SP 800-63B-4). */
const newPassword = z.string({ error: 'Password is required' });

function refinePassword<T extends { password?: string; newPassword?: string; email?: string; displayName?: string }>(key: 'password' | 'newPassword') {
  return (value: T, ctx: z.RefinementCtx) => {
    const password = value[key];
    if (typeof password !== 'string') return;
    const problem = checkPassword(password, { email: value.email, displayName: value.displayName });
    if (problem) ctx.addIssue({ code: 'custom', path: [key], message: problem });
  };
}

export const registerInput = z.object({ email, password: newPassword, displayName, deviceName, deviceId }).superRefine(refinePassword('password'));
export type RegisterInput = z.infer<typeof registerInput>;

export const loginInput = z.object({
  email,
  password: z.string({ error: 'Password is required' }).min(1, 'Password is required'),
  deviceName,
  deviceId,
});
export type LoginInput = z.infer<typeof loginInput>;

export const refreshInput = z.object({
  refreshToken: z.string({ error: 'refreshToken is required' }).min(20, 'refreshToken is malformed').max(200),
});

export const changePasswordInput = z
  .object({ currentPassword: z.string({ error: 'Current password is required' }).min(1), newPassword })
  .superRefine(refinePassword('newPassword'));

export const deleteAccountInput = z.object({
  password: z.string({ error: 'Enter your password to confirm' }).min(1, 'Enter your password to confirm'),
});

export const resetRequestInput = z.object({ email });

/** The signed token of an e-mail confirmation link (a compact JWS, RFC 7515 §7.1). */
export const verifyEmailInput = z.object({
  token: z
    .string({ error: 'token is required' })
    .max(2000, 'token is too long')
    .regex(/^[A-Za-z0-9_-]+\.[A-Za-z0-9_-]+\.[A-Za-z0-9_-]+$/, 'token is malformed'),
});

export const resetConfirmInput = z
  .object({ token: z.string({ error: 'The link is incomplete' }).min(20).max(200), newPassword })
  .superRefine(refinePassword('newPassword'));

/** The account as the API shows it to its owner. */
export interface AccountUser {
  readonly id: string;
  readonly email: string;
  readonly displayName: string;
  readonly role: 'reader' | 'admin';
}

/** Answer of register and login. */
export interface SignedIn {
  readonly user: AccountUser;
  readonly accessToken: string;
  readonly refreshToken: string;
}

export interface TokenPair {
  readonly accessToken: string;
  readonly refreshToken: string;
}

/** Answer of `POST /api/auth/password-reset/request` (the same whether or not the address has an account). */
export interface ResetRequested {
  readonly message: string;
}

/** Answer of `POST /api/auth/verify-email` and `…/verify-email/send` (202 when a new link was mailed). */
export interface EmailVerified {
  readonly verified: boolean;
}
