import * as z from 'zod';

import type { AccountUser } from './auth';

/** The admin API (`/api/admin`): accounts without their journals, and development's caught mail. */

export const adminUserUpdateInput = z
  .object({ disabled: z.boolean().optional(), role: z.enum(['reader', 'admin']).optional() })
  .refine((value) => value.disabled !== undefined || value.role !== undefined, {
    message: 'Send disabled and/or role',
    path: ['disabled'],
  });

/** One account as the admin page lists it. */
export interface AdminUserView extends AccountUser {
  readonly createdAt: string;
  readonly lastSeenAt: string | null;
  readonly disabled: boolean;
  readonly storedBytes: number;
}

/** One message caught by the development mail inbox. */
export interface CaughtMail {
  readonly id: string;
  readonly receivedAt: string;
  readonly from: string;
  readonly to: string[];
  readonly subject: string;
  readonly text: string;
  /** The HTML part, when the mail had one. */
  readonly html?: string;
  /** The List-Unsubscribe header (RFC 2369), when the mail had one. */
  readonly listUnsubscribe?: string;
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
