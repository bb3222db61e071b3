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
