import * as z from 'zod';

import { checkPassword } from './password-policy';

/** Display names are shown to people a reader shares with; keep them short and printable. */
export const DISPLAY_NAME_MAX_LENGTH = 80;

const email = z
  .string({ error: 'E-mail is required' })
  .trim()
  .toLowerCase()
  .pipe(z.email({ error: 'Enter an e-mail address like name@example.com' }).max(254, 'E-mail is too long'));

/**
 * Control characters and lone UTF-16 surrogates are not text a person types, and PostgreSQL
 * refuses NUL in text (SQLSTATE 22021), so names with them are refused here, with a reason.
 */
const NOT_PLAIN_TEXT = /[\u0000-\u001f\u007f]|[\ud800-\udbff](?![\udc00-\udfff])|(?<![\ud800-\udbff])[\udc00-\udfff]/;
const PLAIN_TEXT_MESSAGE = 'Use letters, digits, spaces and punctuation only';
const isPlainText = (value: string) => !NOT_PLAIN_TEXT.test(value);

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

export const renameDeviceInput = z.object({
  name: z.string({ error: 'Name is required' }).trim().min(1, 'Name is required').max(80, 'Use at most 80 characters').refine(isPlainText, PLAIN_TEXT_MESSAGE),
});

export const adminUserUpdateInput = z
  .object({ disabled: z.boolean().optional(), role: z.enum(['reader', 'admin']).optional() })
  .refine((value) => value.disabled !== undefined || value.role !== undefined, {
    message: 'Send disabled and/or role',
    path: ['disabled'],
  });

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

/** A signed-in device, as listed on the reader's devices page. */
export interface DeviceSessionView {
  readonly id: string;
  readonly name: string;
  readonly createdAt: string;
  readonly lastSeenAt: string;
  readonly current: boolean;
}

/** One account as the admin page lists it. */
export interface AdminUserView extends AccountUser {
  readonly createdAt: string;
  readonly lastSeenAt: string | null;
  readonly disabled: boolean;
  readonly storedBytes: number;
}

/** A page of the admin's account list: the accounts matching a search, and how many match in all. */
export interface AdminUserPage {
  readonly accounts: AdminUserView[];
  readonly total: number;
  readonly page: number;
  readonly size: number;
}

/** The account list's query: words in the email or name, and which page (0-based) of how many. */
export const adminUserQuery = z.object({
  q: z.string().trim().max(200, 'must be at most 200 characters').optional().default(''),
  page: z.coerce
    .number({ error: 'must be a whole number' })
    .int('must be a whole number')
    .min(0, 'must be 0 or more')
    .max(100_000, 'is too large')
    .optional()
    .default(0),
  size: z.coerce
    .number({ error: 'must be a whole number' })
    .int('must be a whole number')
    .min(1, 'must be 1 or more')
    .max(200, 'must be at most 200')
    .optional()
    .default(50),
});

/** One message caught by the development mail inbox. */
export interface CaughtMail {
  readonly id: string;
  readonly receivedAt: string;
  readonly from: string;
  readonly to: string[];
  readonly subject: string;
  readonly text: string;
}
