import { browserStorage } from './browser-storage';

const KEY = 'lamplight.deviceId';

/**
 * A stable id for this browser profile on this device: the node id of its clocks, and how the
 * server tells this device's changes from another's. Made once, kept for good.
 */
export function deviceId(): string {
  const existing = browserStorage.read<string>(KEY);
  if (existing) return existing;
  const id = crypto.randomUUID();
  browserStorage.write(KEY, id);
  return id;
}
