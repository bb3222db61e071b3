import { deviceNameFromUserAgent } from '@shared/account/device-name';

/** This browser's name ("Chrome on Linux"), as the server names device sessions. */
export function thisDeviceName(): string {
  return deviceNameFromUserAgent(globalThis.navigator?.userAgent);
}
