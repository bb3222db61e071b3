/**
 * This browser's name ("Chrome on Linux"), as the server names device sessions. The user-agent
 * parser (bowser, ~10 KB gzip) loads only when a name is asked for (starting a timer).
 */
export async function thisDeviceName(): Promise<string> {
  const { deviceNameFromUserAgent } = await import('@shared/account/device-name');
  return deviceNameFromUserAgent(globalThis.navigator?.userAgent);
}
