import * as z from 'zod';

import { isPlainText, PLAIN_TEXT_MESSAGE } from '../account/plain-text';

/** The devices API (`/api/devices`): the reader's signed-in devices, renamed or signed out. */

export const renameDeviceInput = z.object({
  name: z.string({ error: 'Name is required' }).trim().min(1, 'Name is required').max(80, 'Use at most 80 characters').refine(isPlainText, PLAIN_TEXT_MESSAGE),
});

/** A signed-in device, as listed on the reader's devices page. */
export interface DeviceSessionView {
  readonly id: string;
  readonly name: string;
  readonly createdAt: string;
  readonly lastSeenAt: string;
  readonly current: boolean;
}
